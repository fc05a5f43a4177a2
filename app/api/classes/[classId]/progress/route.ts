import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { classParamsSchema } from "@/lib/classes/schemas";
import { classProgress } from "@/lib/progress/class-progress";

export const GET = withAuth<{ classId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId } = classParamsSchema.parse(params);
  return NextResponse.json(await classProgress(user, classId));
});
