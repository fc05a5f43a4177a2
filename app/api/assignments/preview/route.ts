import { NextResponse } from "next/server";
import { readJson, withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { previewSample } from "@/lib/assignments/preview";
import { previewSchema } from "@/lib/assignments/teacher-schemas";

/** A sample of one builder item with its answers: instructors and admins only. */
export const POST = withAuth([...TEACHING_ROLES], async (req) => {
  const input = previewSchema.parse(await readJson(req));
  return NextResponse.json({ preview: previewSample(input) });
});
