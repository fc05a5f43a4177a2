import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { studentAssignment } from "@/lib/assignments/work";

/** The signed-in student's own work on the assignment (404 unless they are in its class and it is published). */
export const GET = withAuth<{ assignmentId: string }>([], async (_req, { user, params }) => NextResponse.json({ work: await studentAssignment(user, Number(params.assignmentId)) }));
