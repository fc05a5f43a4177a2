import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { regenerateJoinCode } from "@/lib/classes/manage";
import { classParamsSchema } from "@/lib/classes/schemas";

/** A new join code; the old one stops working at once. */
export const POST = withAuth<{ classId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId } = classParamsSchema.parse(params);
  return NextResponse.json(await regenerateJoinCode(user, classId));
});
