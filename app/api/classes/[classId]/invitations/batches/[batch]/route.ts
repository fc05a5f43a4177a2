import { NextResponse } from "next/server";
import { z } from "zod";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { batchProgress } from "@/lib/classes/invitations";
import { idParam } from "@/lib/classes/schemas";

const paramsSchema = z.object({ classId: idParam("class id"), batch: z.uuid({ error: "That is not a send id." }) });

/** How many e-mails of one send (typed list, import or resend) have gone; the page polls it until done. */
export const GET = withAuth<{ classId: string; batch: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId, batch } = paramsSchema.parse(params);
  return NextResponse.json(await batchProgress(user, classId, batch), { headers: { "cache-control": "no-store" } });
});
