import { NextResponse } from "next/server";
import { consume } from "@/lib/auth/rate-limit";
import { withAuth } from "@/lib/auth/route";
import { readPhotoUpload } from "@/lib/uploads/request";
import { assignmentParamsSchema, listQuerySchema } from "@/lib/uploads/schemas";
import { listUploads, saveUpload } from "@/lib/uploads/store";

type Params = { assignmentId: string };

export const GET = withAuth<Params>([], async (req, { user, params }) => {
  const { assignmentId } = assignmentParamsSchema.parse(params);
  const { studentId } = listQuerySchema.parse({ studentId: new URL(req.url).searchParams.get("studentId") ?? undefined });
  return NextResponse.json({ uploads: await listUploads(user, assignmentId, studentId) });
});

/** One photo per request (multipart, field "photo"), so the page can show each file's progress. */
export const POST = withAuth<Params>([], async (req, { user, params }) => {
  const { assignmentId } = assignmentParamsSchema.parse(params);
  // Counted before the body is read, so a refused upload costs no parsing or re-encoding.
  await consume("photoUploads", `user:${user.id}`);
  const photo = await readPhotoUpload(req);
  return NextResponse.json({ upload: await saveUpload(user, assignmentId, photo) }, { status: 201 });
});
