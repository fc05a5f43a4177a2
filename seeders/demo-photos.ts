// Shop photos for the demo, drawn rather than photographed: a board with a tape along it and
// pencil ticks at the marks. They go through the uploads' own checks and resizing, so the stored
// full copy and thumbnail are exactly what a real upload would leave in the uploads folder.
import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import sharp from "sharp";
import { inspectPhoto, processPhoto } from "@/lib/uploads/photo";
import type { Random } from "@/lib/problems/random";

const WIDTH = 1200;
const HEIGHT = 800;

/** A pine board on a bench, a tape along its edge, and pencil ticks where the student marked. */
function boardSvg(random: Random): string {
  const top = random.int(260, 340);
  const ticks = Array.from({ length: random.int(4, 7) }, (_, i) => 140 + i * random.int(130, 150));
  const grain = Array.from({ length: 9 }, (_, i) => {
    const y = top + 20 + i * 24 + random.int(-6, 6);
    return `<path d="M40 ${y} C 400 ${y + random.int(-14, 14)}, 800 ${y + random.int(-14, 14)}, 1160 ${y}" stroke="#c9a36b" stroke-width="3" fill="none"/>`;
  }).join("");
  const tape = Array.from({ length: 60 }, (_, i) => {
    const x = 40 + i * 19;
    const long = i % 4 === 0;
    return `<line x1="${x}" y1="${top - 70}" x2="${x}" y2="${top - (long ? 40 : 55)}" stroke="#222" stroke-width="${long ? 3 : 2}"/>`;
  }).join("");
  const marks = ticks
    .map((x) => `<path d="M${x} ${top + 6} L${x + random.int(-3, 3)} ${top + 70}" stroke="#3a3a3a" stroke-width="4" stroke-linecap="round"/><path d="M${x - 14} ${top + 40} L${x} ${top + 70} L${x + 14} ${top + 40}" stroke="#3a3a3a" stroke-width="3" fill="none"/>`)
    .join("");
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${HEIGHT}">
    <rect x="30" y="${top}" width="1140" height="240" rx="6" fill="#e8c48f"/>
    ${grain}
    <rect x="30" y="${top - 80}" width="1140" height="60" fill="#f2d22e"/>
    ${tape}
    ${marks}
    <ellipse cx="${random.int(200, 1000)}" cy="${top + 180}" rx="16" ry="9" fill="#a57a45"/>
  </svg>`;
}

export type DemoPhotoFile = { storedName: string; thumbName: string; mime: string; bytes: number; width: number; height: number };

/** Draws one photo and writes its full copy and thumbnail beside the database, as an upload does. */
export async function writeDemoPhoto(uploadsFolder: string, random: Random): Promise<DemoPhotoFile> {
  // The bench is the canvas; the board, tape and marks are drawn over it.
  const jpeg = await sharp({ create: { width: WIDTH, height: HEIGHT, channels: 3, background: "#6b5a48" } })
    .composite([{ input: Buffer.from(boardSvg(random)) }])
    .jpeg({ quality: 82 })
    .toBuffer();
  const processed = await processPhoto(jpeg, await inspectPhoto(jpeg));
  const storedName = `${crypto.randomUUID()}.${processed.ext}`;
  const thumbName = `${crypto.randomUUID()}.webp`;
  await fs.promises.mkdir(uploadsFolder, { recursive: true });
  await fs.promises.writeFile(path.join(uploadsFolder, storedName), processed.full, { flag: "wx" });
  await fs.promises.writeFile(path.join(uploadsFolder, thumbName), processed.thumb, { flag: "wx" });
  return { storedName, thumbName, mime: processed.mime, bytes: processed.full.byteLength, width: processed.width, height: processed.height };
}

export async function removeDemoPhotos(uploadsFolder: string, files: DemoPhotoFile[]): Promise<void> {
  await Promise.all(files.flatMap((f) => [f.storedName, f.thumbName]).map((name) => fs.promises.rm(path.join(uploadsFolder, name), { force: true })));
}
