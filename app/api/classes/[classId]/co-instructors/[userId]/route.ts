import { NextResponse } from "next/server";
import { z } from "zod";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { removeCoInstructor } from "@/lib/classes/manage";
import { idParam } from "@/lib/classes/schemas";

const paramsSchema = z.object({ classId: idParam("class id"), userId: idParam("user id") });

export const DELETE = withAuth<{ classId: string; userId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId, userId } = paramsSchema.parse(params);
  await removeCoInstructor(user, classId, userId);
  return NextResponse.json({ removed: true });
});
