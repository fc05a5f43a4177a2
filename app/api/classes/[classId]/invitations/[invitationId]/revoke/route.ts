import { NextResponse } from "next/server";
import { z } from "zod";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { revokeInvitation } from "@/lib/classes/invitations";
import { idParam } from "@/lib/classes/schemas";

const paramsSchema = z.object({ classId: idParam("class id"), invitationId: idParam("invitation id") });

export const POST = withAuth<{ classId: string; invitationId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId, invitationId } = paramsSchema.parse(params);
  await revokeInvitation(user, classId, invitationId);
  return NextResponse.json({ revoked: true });
});
