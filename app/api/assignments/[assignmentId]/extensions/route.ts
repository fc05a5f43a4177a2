import { NextResponse } from "next/server";
import { readJson, withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { grantExtension, listExtensions } from "@/lib/assignments/extensions";
import { extensionSchema } from "@/lib/assignments/schemas";
import { assignmentParamsSchema } from "@/lib/assignments/teacher-schemas";

type Params = { assignmentId: string };

export const GET = withAuth<Params>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { assignmentId } = assignmentParamsSchema.parse(params);
  return NextResponse.json({ extensions: await listExtensions(user, assignmentId) });
});

/** Grants or replaces one student's extension. */
export const PUT = withAuth<Params>([...TEACHING_ROLES], async (req, { user, params }) => {
  const { assignmentId } = assignmentParamsSchema.parse(params);
  const data = extensionSchema.parse(await readJson(req));
  return NextResponse.json({ extension: await grantExtension(user, assignmentId, data) });
});
