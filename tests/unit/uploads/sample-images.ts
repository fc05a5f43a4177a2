import zlib from "node:zlib";
import sharp from "sharp";

// Real images made on the spot, so every test starts from bytes a camera or phone could send.

type Format = "jpeg" | "png" | "webp";

/** A noisy picture (so it compresses like a photo) with camera metadata and, if asked, an orientation tag. */
export async function cameraPhoto(format: Format, { width = 640, height = 480, orientation }: { width?: number; height?: number; orientation?: number } = {}): Promise<Buffer> {
  let image = sharp({ create: { width, height, channels: 3, background: "#808080", noise: { type: "gaussian", mean: 128, sigma: 40 } } })
    .withExif({
      IFD0: { Copyright: "secret-copyright", Artist: "secret-artist", Make: "SecretCam" },
      IFD3: { GPSLatitudeRef: "N", GPSLatitude: "47/1 36/1 2/1", GPSLongitudeRef: "W", GPSLongitude: "122/1 19/1 55/1" },
    })
    .withIccProfile("p3");
  if (orientation) image = image.withMetadata({ orientation });
  return image.toFormat(format).toBuffer();
}

/** A tiny PDF: enough for any content check to know it. */
export function pdfFile(): Buffer {
  return Buffer.from("%PDF-1.4\n1 0 obj << /Type /Catalog /Pages 2 0 R >> endobj\n2 0 obj << /Type /Pages /Kids [] /Count 0 >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n");
}

/** A ZIP with one stored (uncompressed) file, laid out by hand from the format's own headers. */
export function zipFile(name: string, content: string): Buffer {
  const data = Buffer.from(content);
  const fileName = Buffer.from(name);
  const crc = zlib.crc32(data);
  const local = Buffer.alloc(30);
  local.writeUInt32LE(0x04034b50, 0);
  local.writeUInt16LE(10, 4);
  local.writeUInt32LE(crc, 14);
  local.writeUInt32LE(data.length, 18);
  local.writeUInt32LE(data.length, 22);
  local.writeUInt16LE(fileName.length, 26);
  const central = Buffer.alloc(46);
  central.writeUInt32LE(0x02014b50, 0);
  central.writeUInt16LE(20, 4);
  central.writeUInt16LE(10, 6);
  central.writeUInt32LE(crc, 16);
  central.writeUInt32LE(data.length, 20);
  central.writeUInt32LE(data.length, 24);
  central.writeUInt16LE(fileName.length, 28);
  const centralOffset = local.length + fileName.length + data.length;
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(1, 8);
  end.writeUInt16LE(1, 10);
  end.writeUInt32LE(central.length + fileName.length, 12);
  end.writeUInt32LE(centralOffset, 16);
  return Buffer.concat([local, fileName, data, central, fileName, end]);
}

/** A flat grey PNG of 64 megapixels: a few hundred kilobytes on disk, 64 MB once decoded. */
export async function decompressionBomb(): Promise<Buffer> {
  return sharp({ create: { width: 8000, height: 8000, channels: 3, background: "#808080" } }).greyscale().png({ compressionLevel: 9 }).toBuffer();
}
