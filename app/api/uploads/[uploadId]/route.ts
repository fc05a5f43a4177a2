import { NextResponse } from "next/server";
import { readJson, withAuth } from "@/lib/auth/route";
import { commentSchema, fileQuerySchema, uploadParamsSchema } from "@/lib/uploads/schemas";
import { commentOnUpload, deleteUpload, openUpload } from "@/lib/uploads/store";

type Params = { uploadId: string };

export const GET = withAuth<Params>([], async (req, { user, params }) => {
  const { uploadId } = uploadParamsSchema.parse(params);
  const { size } = fileQuerySchema.parse({ size: new URL(req.url).searchParams.get("size") ?? undefined });
  const file = await openUpload(user, uploadId, size);
  return new Response(file.body, {
    headers: {
      "Content-Type": file.mime,
      "Content-Length": String(file.bytes),
      // The type is ours (decided from the content), so the browser must not guess another.
      "X-Content-Type-Options": "nosniff",
      "Content-Disposition": `inline; filename="${file.fileName}"`,
      "Cache-Control": "private, max-age=3600",
    },
  });
});

export const PATCH = withAuth<Params>([], async (req, { user, params }) => {
  const { uploadId } = uploadParamsSchema.parse(params);
  const input = commentSchema.parse(await readJson(req));
  return NextResponse.json({ upload: await commentOnUpload(user, uploadId, input) });
});

export const DELETE = withAuth<Params>([], async (_req, { user, params }) => {
  const { uploadId } = uploadParamsSchema.parse(params);
  await deleteUpload(user, uploadId);
  return new NextResponse(null, { status: 204 });
});
