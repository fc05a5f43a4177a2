import { NextResponse } from "next/server";
import { readJson, withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { overrideScore } from "@/lib/gradebook/override";
import { cellParams } from "@/lib/gradebook/params";
import { overrideSchema } from "@/lib/gradebook/schemas";

/** {points, reason} | {excused: true, reason} | {clear: true, reason}; the student is e-mailed. */
export const POST = withAuth<{ classId: string; assignmentId: string; studentId: string }>([...TEACHING_ROLES], async (req, { user, params }) => {
  const { classId, assignmentId, studentId } = cellParams.parse(params);
  const input = overrideSchema.parse(await readJson(req));
  return NextResponse.json(await overrideScore(user, classId, assignmentId, studentId, input), { status: 201 });
});
