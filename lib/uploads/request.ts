import { AppError } from "@/lib/errors";
import { MAX_PHOTO_BYTES, MAX_REQUEST_BYTES, formatBytes } from "./limits";

export type ReceivedPhoto = { bytes: Buffer; name: string };

function tooLarge(bytes?: number): AppError {
  const size = bytes ? `That upload is ${formatBytes(bytes)}; ` : "That upload is too big; ";
  return new AppError("too_large", `${size}a photo can be at most ${formatBytes(MAX_PHOTO_BYTES)}. Send a smaller copy.`);
}

function noPhoto(): AppError {
  const message = "Choose a photo to send.";
  return new AppError("bad_request", message, { photo: message });
}

// Past the cap the rest of a body is read and thrown away, up to this much: a browser that is
// still sending when the refusal comes reads it only if the connection stays open until it has
// finished. Beyond this the sender is not a browser with a big photo, and the stream is cut.
const DRAIN_LIMIT_BYTES = 8 * MAX_REQUEST_BYTES;

/**
 * Reads at most MAX_REQUEST_BYTES of the body. A declared Content-Length over that is refused
 * before a byte is read; a body sent without one (chunked) or longer than it said is refused once
 * it passes the cap, so nobody can make the server hold more than one photo's worth per request.
 */
async function readCapped(req: Request): Promise<Uint8Array<ArrayBuffer>> {
  if (!req.body) throw noPhoto();
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > DRAIN_LIMIT_BYTES) {
      await reader.cancel().catch(() => {});
      throw tooLarge();
    }
    if (total <= MAX_REQUEST_BYTES) chunks.push(value);
  }
  if (total > MAX_REQUEST_BYTES) throw tooLarge(total);
  const body = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    body.set(chunk, at);
    at += chunk.byteLength;
  }
  return body;
}

/** The one photo in a multipart form's `photo` field, with the name the browser gave it. */
export async function readPhotoUpload(req: Request): Promise<ReceivedPhoto> {
  const declared = Number(req.headers.get("content-length"));
  if (Number.isFinite(declared) && declared > MAX_REQUEST_BYTES) throw tooLarge(declared);
  const contentType = req.headers.get("content-type") ?? "";
  if (!contentType.toLowerCase().startsWith("multipart/form-data")) {
    const message = "Send the photo as a file upload (multipart/form-data) in the field “photo”.";
    throw new AppError("bad_request", message, { photo: message });
  }
  const body = await readCapped(req);
  let form: FormData;
  try {
    form = await new Response(body, { headers: { "content-type": contentType } }).formData();
  } catch {
    const message = "The upload arrived incomplete. Try sending the photo again.";
    throw new AppError("bad_request", message, { photo: message });
  }
  const photo = form.get("photo");
  if (!(photo instanceof File) || photo.size === 0) throw noPhoto();
  if (photo.size > MAX_PHOTO_BYTES) throw tooLarge(photo.size);
  return { bytes: Buffer.from(await photo.arrayBuffer()), name: photo.name };
}
