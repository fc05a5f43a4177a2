import { NextResponse } from "next/server";
import { readJson, withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { addCoInstructor } from "@/lib/classes/manage";
import { classParamsSchema, coInstructorSchema } from "@/lib/classes/schemas";

export const POST = withAuth<{ classId: string }>([...TEACHING_ROLES], async (req, { user, params }) => {
  const { classId } = classParamsSchema.parse(params);
  const { email } = coInstructorSchema.parse(await readJson(req));
  return NextResponse.json({ coInstructor: await addCoInstructor(user, classId, email) }, { status: 201 });
});
