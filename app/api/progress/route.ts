import { NextResponse } from "next/server";
import { z } from "zod";
import { readJson, withAuth } from "@/lib/auth/route";
import { lessonSlugs } from "@/lib/lessons/catalog";
import { progressFor, recordProgress } from "@/lib/lessons/progress";

const bodySchema = z.object({
  slug: z.string({ error: "Say which lesson (slug)." }).max(80, { error: "That lesson name is too long." }),
  // "practised" is set by the practice grader, not by the reader.
  status: z.enum(["opened", "completed"], { error: 'Status must be "opened" or "completed".' }),
});

export const GET = withAuth([], async (_req, { user }) => NextResponse.json({ progress: await progressFor(user) }));

export const POST = withAuth([], async (req, { user }) => {
  const { slug, status } = bodySchema.parse(await readJson(req));
  return NextResponse.json({ slug, status: await recordProgress(user, slug, status, lessonSlugs()) });
});
