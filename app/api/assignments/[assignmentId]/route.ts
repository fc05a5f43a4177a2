import { NextResponse } from "next/server";
import { readJson, withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { deleteDraft, updateAssignment } from "@/lib/assignments/manage";
import { assignmentSchema } from "@/lib/assignments/schemas";
import { assignmentParamsSchema } from "@/lib/assignments/teacher-schemas";
import { getTeacherAssignment } from "@/lib/assignments/teacher-views";

type Params = { assignmentId: string };

export const GET = withAuth<Params>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { assignmentId } = assignmentParamsSchema.parse(params);
  return NextResponse.json({ assignment: await getTeacherAssignment(user, assignmentId) });
});

/** The whole builder form, as on create; items and tries are refused once ever published. */
export const PATCH = withAuth<Params>([...TEACHING_ROLES], async (req, { user, params }) => {
  const { assignmentId } = assignmentParamsSchema.parse(params);
  const data = assignmentSchema.parse(await readJson(req));
  return NextResponse.json({ assignment: await updateAssignment(user, assignmentId, data) });
});

export const DELETE = withAuth<Params>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { assignmentId } = assignmentParamsSchema.parse(params);
  await deleteDraft(user, assignmentId);
  return new NextResponse(null, { status: 204 });
});
