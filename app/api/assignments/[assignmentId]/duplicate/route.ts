import { NextResponse } from "next/server";
import { readJson, withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { duplicateAssignment } from "@/lib/assignments/manage";
import { assignmentParamsSchema, duplicateSchema } from "@/lib/assignments/teacher-schemas";

export const POST = withAuth<{ assignmentId: string }>([...TEACHING_ROLES], async (req, { user, params }) => {
  const { assignmentId } = assignmentParamsSchema.parse(params);
  const { classId } = duplicateSchema.parse(await readJson(req));
  return NextResponse.json({ assignment: await duplicateAssignment(user, assignmentId, classId) }, { status: 201 });
});
