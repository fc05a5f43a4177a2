import { NextResponse } from "next/server";
import { readJson, withAuth } from "@/lib/auth/route";
import { createLayout, listLayouts } from "@/lib/layouts/saved";
import { createLayoutSchema } from "@/lib/layouts/schemas";

export const GET = withAuth([], async (_req, { user }) => NextResponse.json({ layouts: await listLayouts(user) }));

export const POST = withAuth([], async (req, { user }) => {
  const input = createLayoutSchema.parse(await readJson(req));
  return NextResponse.json({ layout: await createLayout(user, input) }, { status: 201 });
});
