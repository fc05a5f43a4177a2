import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { myProgress } from "@/lib/progress/my-progress";

export const GET = withAuth([], async (_req, { user }) => NextResponse.json(await myProgress(user)));
