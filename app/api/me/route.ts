import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";

export const GET = withAuth([], async (_req, { user }) => NextResponse.json({ user }));
