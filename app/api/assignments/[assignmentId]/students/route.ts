import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { assignmentForTeacher } from "@/lib/assignments/access";
import { scoresForAssignment } from "@/lib/assignments/scores";

/** Every active student's status and score, for the class's instructors. */
export const GET = withAuth<{ assignmentId: string }>(["instructor", "admin"], async (_req, { user, params }) => {
  const assignment = await assignmentForTeacher(user, Number(params.assignmentId));
  return NextResponse.json({ students: await scoresForAssignment(assignment) });
});
