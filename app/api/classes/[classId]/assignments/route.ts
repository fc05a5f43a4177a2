import { NextResponse } from "next/server";
import { readJson, withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { createAssignment } from "@/lib/assignments/manage";
import { assignmentSchema } from "@/lib/assignments/schemas";
import { classParamsSchema, listQuerySchema } from "@/lib/assignments/teacher-schemas";
import { listClassAssignments } from "@/lib/assignments/teacher-views";

export const GET = withAuth<{ classId: string }>([...TEACHING_ROLES], async (req, { user, params }) => {
  const { classId } = classParamsSchema.parse(params);
  const { page } = listQuerySchema.parse(Object.fromEntries(new URL(req.url).searchParams));
  return NextResponse.json(await listClassAssignments(user, classId, page));
});

export const POST = withAuth<{ classId: string }>([...TEACHING_ROLES], async (req, { user, params }) => {
  const { classId } = classParamsSchema.parse(params);
  const data = assignmentSchema.parse(await readJson(req));
  return NextResponse.json({ assignment: await createAssignment(user, classId, data) }, { status: 201 });
});
