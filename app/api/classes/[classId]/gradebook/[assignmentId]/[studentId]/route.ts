import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { drillDown } from "@/lib/gradebook/drill-down";
import { cellParams } from "@/lib/gradebook/params";

/** One cell opened: the student's problems and tries, photos, and the override history. */
export const GET = withAuth<{ classId: string; assignmentId: string; studentId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId, assignmentId, studentId } = cellParams.parse(params);
  return NextResponse.json(await drillDown(user, classId, assignmentId, studentId));
});
