import { fileTypeFromBuffer } from "file-type";
import sharp from "sharp";
import { AppError } from "@/lib/errors";
import { MAX_PHOTO_BYTES, PHOTO_MIME_TYPES, formatBytes, type PhotoMime } from "./limits";

// The stored copy is big enough to read pencil marks on a tape, small enough to open on a phone.
export const MAX_LONG_EDGE = 3000;
export const THUMB_WIDTH = 320;
/**
 * A decompression bomb is a small file that claims a huge canvas. 60 megapixels covers every
 * common phone camera (48–50 MP) while keeping one decode well inside the server's memory.
 */
export const MAX_INPUT_PIXELS = 60_000_000;

const REFUSE_HINT = "Send a JPEG, PNG or WebP.";

// How the refusal names what was sent: people know "a PDF" better than "application/pdf".
const KNOWN_KINDS: Record<string, string> = {
  pdf: "a PDF",
  heic: "a HEIC photo (the iPhone camera's own format; set the camera to “Most Compatible” or share it as JPEG)",
  avif: "an AVIF image",
  gif: "a GIF",
  tif: "a TIFF image",
  bmp: "a BMP image",
  zip: "a ZIP archive",
  docx: "a Word document",
  xlsx: "a spreadsheet",
  mp4: "a video",
  mov: "a video",
};

export type InspectedPhoto = { mime: PhotoMime; ext: "jpg" | "png" | "webp" };

/** Decides the type from the bytes alone; the file's name and the browser's type are never asked. */
export async function inspectPhoto(bytes: Uint8Array): Promise<InspectedPhoto> {
  if (bytes.byteLength === 0) throw new AppError("bad_request", "That file is empty. " + REFUSE_HINT, { photo: "That file is empty." });
  if (bytes.byteLength > MAX_PHOTO_BYTES) {
    throw new AppError("too_large", `That photo is ${formatBytes(bytes.byteLength)}; the limit is ${formatBytes(MAX_PHOTO_BYTES)} a photo.`);
  }
  const found = await fileTypeFromBuffer(bytes);
  if (found && (PHOTO_MIME_TYPES as readonly string[]).includes(found.mime)) {
    const mime = found.mime as PhotoMime;
    return { mime, ext: mime === "image/jpeg" ? "jpg" : mime === "image/png" ? "png" : "webp" };
  }
  const kind = found ? (KNOWN_KINDS[found.ext] ?? `a ${found.ext.toUpperCase()} file`) : null;
  const message = kind ? `That file is ${kind}, not a photo. ${REFUSE_HINT}` : `That file is not a photo we can read. ${REFUSE_HINT}`;
  throw new AppError("bad_request", message, { photo: message });
}

export type ProcessedPhoto = { full: Buffer; thumb: Buffer; width: number; height: number; mime: PhotoMime; ext: InspectedPhoto["ext"] };

/**
 * Re-encodes the photo so nothing the camera wrote survives: sharp keeps no EXIF, GPS, XMP or
 * ICC data unless asked to (we never ask), and anything after the image data — a ZIP glued on
 * the end, say — is not part of what is decoded, so it is gone too. Orientation is applied to
 * the pixels first, because the EXIF tag that says "turn me" is dropped with the rest.
 */
export async function processPhoto(bytes: Uint8Array, inspected: InspectedPhoto): Promise<ProcessedPhoto> {
  const open = () => sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS, failOn: "warning", pages: 1 });
  try {
    const meta = await open().metadata();
    if (meta.width && meta.height && meta.width * meta.height > MAX_INPUT_PIXELS) throw bomb();
    let pipeline = open().rotate().resize({ width: MAX_LONG_EDGE, height: MAX_LONG_EDGE, fit: "inside", withoutEnlargement: true });
    pipeline =
      inspected.mime === "image/jpeg"
        ? pipeline.jpeg({ quality: 85, mozjpeg: true })
        : inspected.mime === "image/png"
          ? pipeline.png({ compressionLevel: 9 })
          : pipeline.webp({ quality: 85 });
    const { data: full, info } = await pipeline.toBuffer({ resolveWithObject: true });
    const thumb = await sharp(full).resize({ width: THUMB_WIDTH, height: THUMB_WIDTH * 2, fit: "inside", withoutEnlargement: true }).webp({ quality: 75 }).toBuffer();
    return { full, thumb, width: info.width, height: info.height, mime: inspected.mime, ext: inspected.ext };
  } catch (error) {
    if (error instanceof AppError) throw error;
    if (error instanceof Error && /pixel limit/i.test(error.message)) throw bomb();
    const message = "That photo looks damaged or cut short, so we cannot open it. Take or export it again and resend it.";
    throw new AppError("bad_request", message, { photo: message });
  }
}

function bomb(): AppError {
  const message = `That image is too large to open (over ${MAX_INPUT_PIXELS / 1_000_000} megapixels). Send a smaller copy.`;
  return new AppError("bad_request", message, { photo: message });
}
