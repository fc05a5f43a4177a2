import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { setArchived } from "@/lib/classes/manage";
import { classParamsSchema } from "@/lib/classes/schemas";

// Brings an archived class back into the lists, with its roster and join code as they were.
export const POST = withAuth<{ classId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId } = classParamsSchema.parse(params);
  return NextResponse.json({ summary: await setArchived(user, classId, false) });
});
