import { NextResponse } from "next/server";
import { readJson, withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { updateClass } from "@/lib/classes/manage";
import { classSettings } from "@/lib/classes/queries";
import { classParamsSchema, classSchema } from "@/lib/classes/schemas";

export const GET = withAuth<{ classId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId } = classParamsSchema.parse(params);
  return NextResponse.json(await classSettings(user, classId));
});

export const PATCH = withAuth<{ classId: string }>([...TEACHING_ROLES], async (req, { user, params }) => {
  const { classId } = classParamsSchema.parse(params);
  const input = classSchema.parse(await readJson(req));
  return NextResponse.json({ summary: await updateClass(user, classId, input) });
});
