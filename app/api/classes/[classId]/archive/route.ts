import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { setArchived } from "@/lib/classes/manage";
import { classParamsSchema } from "@/lib/classes/schemas";

// Hides the class from every list; nothing is deleted, and restore brings it back as it was.
export const POST = withAuth<{ classId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId } = classParamsSchema.parse(params);
  return NextResponse.json({ summary: await setArchived(user, classId, true) });
});
