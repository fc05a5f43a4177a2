import { NextResponse } from "next/server";
import { readJson, withAuth } from "@/lib/auth/route";
import { deleteLayout, renameLayout } from "@/lib/layouts/saved";
import { layoutIdSchema, renameLayoutSchema } from "@/lib/layouts/schemas";

export const PATCH = withAuth<{ id: string }>([], async (req, { user, params }) => {
  const { id } = layoutIdSchema.parse(params);
  const { name } = renameLayoutSchema.parse(await readJson(req));
  return NextResponse.json({ layout: await renameLayout(user, id, name) });
});

export const DELETE = withAuth<{ id: string }>([], async (_req, { user, params }) => {
  const { id } = layoutIdSchema.parse(params);
  await deleteLayout(user, id);
  return new NextResponse(null, { status: 204 });
});
