import { NextResponse } from "next/server";
import { consume } from "@/lib/auth/rate-limit";
import { readJson, withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { inviteByEmail } from "@/lib/classes/invitations";
import { classParamsSchema, inviteSchema } from "@/lib/classes/schemas";

export const POST = withAuth<{ classId: string }>([...TEACHING_ROLES], async (req, { user, params }) => {
  const { classId } = classParamsSchema.parse(params);
  const { addresses } = inviteSchema.parse(await readJson(req));
  await consume("sendInvitations", `user:${user.id}`);
  return NextResponse.json(await inviteByEmail(user, classId, addresses), { status: 201 });
});
