import { NextResponse } from "next/server";
import { readJson, withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { createClass } from "@/lib/classes/manage";
import { listTeachingClasses } from "@/lib/classes/queries";
import { classSchema } from "@/lib/classes/schemas";

/** ?archived=1 lists the archived classes instead of the current ones. */
export const GET = withAuth([...TEACHING_ROLES], async (req, { user }) => {
  const archived = new URL(req.url).searchParams.get("archived") === "1";
  return NextResponse.json({ classes: await listTeachingClasses(user, { archived }) });
});

export const POST = withAuth([...TEACHING_ROLES], async (req, { user }) => {
  const input = classSchema.parse(await readJson(req));
  return NextResponse.json(await createClass(user, input), { status: 201 });
});
