import { NextResponse } from "next/server";
import { z } from "zod";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { getClassWithRoster } from "@/lib/classes/queries";

const paramsSchema = z.object({ classId: z.coerce.number({ error: "The class id must be a number." }).int().positive() });

export const GET = withAuth<{ classId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId } = paramsSchema.parse(params);
  return NextResponse.json(await getClassWithRoster(user, classId));
});
