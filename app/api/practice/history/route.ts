import { NextResponse } from "next/server";
import { withAuth } from "@/lib/auth/route";
import { masteryFor, practiceHistory } from "@/lib/practice/history";
import { historyQuerySchema } from "@/lib/practice/schemas";

export const GET = withAuth([], async (req, { user }) => {
  const { page } = historyQuerySchema.parse(Object.fromEntries(new URL(req.url).searchParams));
  const [history, mastery] = await Promise.all([practiceHistory(user, page), masteryFor(user)]);
  return NextResponse.json({ ...history, mastery });
});
