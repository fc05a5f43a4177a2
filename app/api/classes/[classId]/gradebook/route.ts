import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { gradebook } from "@/lib/gradebook/gradebook";
import { classParams } from "@/lib/gradebook/params";

/** Students × published assignments with totals, for the class's instructors. */
export const GET = withAuth<{ classId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId } = classParams.parse(params);
  return NextResponse.json({ gradebook: await gradebook(user, classId) });
});
