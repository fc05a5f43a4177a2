import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { rosterPage } from "@/lib/classes/roster";
import { classParamsSchema, rosterQuerySchema } from "@/lib/classes/schemas";

/** Students and open invitations: ?q= searches name and e-mail, ?status= filters, ?page= pages by 25. */
export const GET = withAuth<{ classId: string }>([...TEACHING_ROLES], async (req, { user, params }) => {
  const { classId } = classParamsSchema.parse(params);
  const query = rosterQuerySchema.parse(Object.fromEntries(new URL(req.url).searchParams));
  return NextResponse.json(await rosterPage(user, classId, query));
});
