import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { removeExtension } from "@/lib/assignments/extensions";
import { extensionParamsSchema } from "@/lib/assignments/teacher-schemas";

export const DELETE = withAuth<{ assignmentId: string; studentId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { assignmentId, studentId } = extensionParamsSchema.parse(params);
  await removeExtension(user, assignmentId, studentId);
  return new NextResponse(null, { status: 204 });
});
