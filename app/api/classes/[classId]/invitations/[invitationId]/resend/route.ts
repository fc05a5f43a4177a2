import { NextResponse } from "next/server";
import { z } from "zod";
import { consume } from "@/lib/auth/rate-limit";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { resendInvitation } from "@/lib/classes/invitations";
import { idParam } from "@/lib/classes/schemas";

const paramsSchema = z.object({ classId: idParam("class id"), invitationId: idParam("invitation id") });

export const POST = withAuth<{ classId: string; invitationId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId, invitationId } = paramsSchema.parse(params);
  await consume("sendInvitations", `user:${user.id}`);
  return NextResponse.json(await resendInvitation(user, classId, invitationId));
});
