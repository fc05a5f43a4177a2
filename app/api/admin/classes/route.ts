import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { allClassesOverview } from "@/lib/progress/all-classes";

export const GET = withAuth(["admin"], async (_req, { user }) => NextResponse.json({ classes: await allClassesOverview(user) }));
