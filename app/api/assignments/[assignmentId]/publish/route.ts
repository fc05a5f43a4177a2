import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { publishAssignment } from "@/lib/assignments/manage";
import { assignmentParamsSchema } from "@/lib/assignments/teacher-schemas";

export const POST = withAuth<{ assignmentId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { assignmentId } = assignmentParamsSchema.parse(params);
  return NextResponse.json(await publishAssignment(user, assignmentId));
});
