import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { assignmentForTeacher } from "@/lib/assignments/access";
import { studentReview } from "@/lib/assignments/student-review";

/** One student's variants, every answer and the score, for the class's instructors (answers included). */
export const GET = withAuth<{ assignmentId: string; studentId: string }>(["instructor", "admin"], async (_req, { user, params }) => {
  const assignment = await assignmentForTeacher(user, Number(params.assignmentId));
  return NextResponse.json({ review: await studentReview(assignment, Number(params.studentId)) });
});
