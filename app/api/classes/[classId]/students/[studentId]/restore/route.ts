import { NextResponse } from "next/server";
import { z } from "zod";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { readdStudent } from "@/lib/classes/roster";
import { idParam } from "@/lib/classes/schemas";

const paramsSchema = z.object({ classId: idParam("class id"), studentId: idParam("student id") });

/** Adds a removed student back; their earlier work is still there. */
export const POST = withAuth<{ classId: string; studentId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId, studentId } = paramsSchema.parse(params);
  await readdStudent(user, classId, studentId);
  return NextResponse.json({ status: "active" });
});
