import { NextResponse } from "next/server";
import { z } from "zod";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { removeStudent } from "@/lib/classes/roster";
import { idParam } from "@/lib/classes/schemas";

const paramsSchema = z.object({ classId: idParam("class id"), studentId: idParam("student id") });

/** Marks the enrollment removed; the student's work stays in the database. */
export const DELETE = withAuth<{ classId: string; studentId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId, studentId } = paramsSchema.parse(params);
  await removeStudent(user, classId, studentId);
  return NextResponse.json({ status: "removed" });
});
