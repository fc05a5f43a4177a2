import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { listTeachingClasses } from "@/lib/classes/queries";

export const GET = withAuth([...TEACHING_ROLES], async (_req, { user }) => NextResponse.json({ classes: await listTeachingClasses(user) }));
