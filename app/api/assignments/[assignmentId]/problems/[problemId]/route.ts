import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { studentProblem } from "@/lib/assignments/work";

/** One of the signed-in student's own problems; anyone else's is a 404. */
export const GET = withAuth<{ assignmentId: string; problemId: string }>([], async (_req, { user, params }) =>
  NextResponse.json({ problem: await studentProblem(user, Number(params.assignmentId), params.problemId) }),
);
