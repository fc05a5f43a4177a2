import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/errors";
import { MAX_LONG_EDGE, THUMB_WIDTH, inspectPhoto, processPhoto } from "@/lib/uploads/photo";
import { MAX_PHOTO_BYTES } from "@/lib/uploads/limits";
import { cameraPhoto, decompressionBomb, pdfFile, zipFile } from "./sample-images";

async function refusal(work: Promise<unknown>): Promise<AppError> {
  const error = await work.then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(AppError);
  return error as AppError;
}

const SECRETS = ["secret-copyright", "secret-artist", "SecretCam"];

async function expectNoMetadata(bytes: Buffer) {
  const meta = await sharp(bytes).metadata();
  expect(meta.exif).toBeUndefined();
  expect(meta.icc).toBeUndefined();
  expect(meta.xmp).toBeUndefined();
  expect(meta.orientation).toBeUndefined();
  for (const secret of SECRETS) expect(bytes.includes(secret)).toBe(false);
}

describe("inspectPhoto decides by content", () => {
  it.each([
    ["jpeg", "image/jpeg", "jpg"],
    ["png", "image/png", "png"],
    ["webp", "image/webp", "webp"],
  ] as const)("accepts a %s", async (format, mime, ext) => {
    expect(await inspectPhoto(await cameraPhoto(format))).toEqual({ mime, ext });
  });

  it("refuses a PDF and names it", async () => {
    const error = await refusal(inspectPhoto(pdfFile()));
    expect(error.status).toBe(400);
    expect(error.message).toBe("That file is a PDF, not a photo. Send a JPEG, PNG or WebP.");
    expect(error.fields).toHaveProperty("photo");
  });

  it("refuses plain text, whatever it was called (the name never reaches the check)", async () => {
    const error = await refusal(inspectPhoto(Buffer.from("layout: 16 in o.c., 8 battens\n".repeat(40))));
    expect(error.message).toBe("That file is not a photo we can read. Send a JPEG, PNG or WebP.");
  });

  it("refuses a GIF and a ZIP by what they are", async () => {
    const gif = await sharp({ create: { width: 8, height: 8, channels: 3, background: "#000" } }).gif().toBuffer();
    expect((await refusal(inspectPhoto(gif))).message).toMatch(/^That file is a GIF, not a photo\./);
    expect((await refusal(inspectPhoto(zipFile("a.txt", "hello")))).message).toMatch(/^That file is a ZIP archive, not a photo\./);
  });

  it("refuses an empty file and one over 10 MB", async () => {
    expect((await refusal(inspectPhoto(Buffer.alloc(0)))).message).toMatch(/empty/);
    const big = Buffer.concat([await cameraPhoto("jpeg"), Buffer.alloc(MAX_PHOTO_BYTES)]);
    const error = await refusal(inspectPhoto(big));
    expect(error.status).toBe(413);
    expect(error.message).toMatch(/limit is 10\.0\sMB/);
  });
});

describe("processPhoto re-encodes without metadata", () => {
  it.each(["jpeg", "png", "webp"] as const)("a %s keeps its format and loses EXIF, GPS and ICC data", async (format) => {
    const original = await cameraPhoto(format);
    const before = await sharp(original).metadata();
    // The sample really carries what we strip, or this test would prove nothing.
    expect(before.exif).toBeDefined();
    expect(before.icc).toBeDefined();
    expect(original.includes("secret-copyright")).toBe(true);

    const result = await processPhoto(original, await inspectPhoto(original));
    const after = await sharp(result.full).metadata();
    expect(after.format).toBe(format);
    expect([result.width, result.height]).toEqual([640, 480]);
    await expectNoMetadata(result.full);

    const thumb = await sharp(result.thumb).metadata();
    expect(thumb.format).toBe("webp");
    expect(thumb.width).toBe(THUMB_WIDTH);
    await expectNoMetadata(result.thumb);
  });

  it("turns the pixels as the camera's orientation tag said, then drops the tag", async () => {
    // Orientation 6: the camera was held upright, so the stored 400 × 200 picture is shown 200 × 400.
    const original = await cameraPhoto("jpeg", { width: 400, height: 200, orientation: 6 });
    const result = await processPhoto(original, await inspectPhoto(original));
    expect([result.width, result.height]).toEqual([200, 400]);
    expect((await sharp(result.full).metadata()).orientation).toBeUndefined();
  });

  it(`caps the long edge at ${MAX_LONG_EDGE} px and never enlarges a small photo`, async () => {
    const wide = await sharp({ create: { width: 4000, height: 1000, channels: 3, background: "#c8b89a" } }).jpeg().toBuffer();
    const result = await processPhoto(wide, await inspectPhoto(wide));
    expect([result.width, result.height]).toEqual([3000, 750]);

    const small = await sharp({ create: { width: 200, height: 100, channels: 3, background: "#c8b89a" } }).png().toBuffer();
    const kept = await processPhoto(small, await inspectPhoto(small));
    expect([kept.width, kept.height]).toEqual([200, 100]);
    expect((await sharp(kept.thumb).metadata()).width).toBe(200);
  });

  it("refuses a JPEG cut short in transfer", async () => {
    const whole = await cameraPhoto("jpeg");
    const truncated = whole.subarray(0, Math.floor(whole.length * 0.6));
    const inspected = await inspectPhoto(truncated);
    expect(inspected.mime).toBe("image/jpeg");
    const error = await refusal(processPhoto(truncated, inspected));
    expect(error.status).toBe(400);
    expect(error.message).toMatch(/damaged or cut short/);
  });

  it("refuses bytes that start like a JPEG but are not one", async () => {
    const fake = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.from("not really a picture".repeat(20))]);
    const error = await refusal(processPhoto(fake, await inspectPhoto(fake)));
    expect(error.message).toMatch(/damaged or cut short/);
  });

  it("refuses a decompression bomb before decoding it", async () => {
    const bomb = await decompressionBomb();
    expect(bomb.length).toBeLessThan(MAX_PHOTO_BYTES);
    const error = await refusal(processPhoto(bomb, await inspectPhoto(bomb)));
    expect(error.status).toBe(400);
    expect(error.message).toMatch(/too large to open \(over 60 megapixels\)/);
  });

  it("accepts a JPEG with a ZIP glued on the end and stores only the picture", async () => {
    const photo = await cameraPhoto("jpeg");
    const polyglot = Buffer.concat([photo, zipFile("payload.txt", "hidden-payload")]);
    expect(polyglot.includes("hidden-payload")).toBe(true);

    const inspected = await inspectPhoto(polyglot);
    expect(inspected.mime).toBe("image/jpeg");
    const result = await processPhoto(polyglot, inspected);
    expect(result.full.includes("hidden-payload")).toBe(false);
    expect(result.full.includes(Buffer.from([0x50, 0x4b, 0x03, 0x04]))).toBe(false);
    // A clean JPEG ends at its end-of-image marker.
    expect(result.full.subarray(-2)).toEqual(Buffer.from([0xff, 0xd9]));
    await expectNoMetadata(result.full);
  });
});
