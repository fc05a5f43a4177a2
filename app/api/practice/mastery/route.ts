import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { masteryFor } from "@/lib/practice/history";

export const GET = withAuth([], async (_req, { user }) => NextResponse.json({ mastery: await masteryFor(user) }));
