import "server-only";
import fs from "node:fs";
import path from "node:path";
import { headingId } from "./text";

// Lessons are the MDX files in content/lessons, named NN-slug.mdx; NN orders the course and
// the slug is the address. Read once per process: the folder only changes with a new build.
const DIR = path.join(process.cwd(), "content", "lessons");

export type LessonFile = { slug: string; file: string };
export type Heading = { depth: 2 | 3; text: string; id: string };

let cached: LessonFile[] | undefined;

export function lessonFiles(): LessonFile[] {
  cached ??= fs
    .readdirSync(DIR)
    .filter((f) => /^\d{2}-[a-z0-9-]+\.mdx$/.test(f))
    .sort()
    .map((file) => ({ file, slug: file.replace(/^\d{2}-/, "").replace(/\.mdx$/, "") }));
  return cached;
}

export function lessonSlugs(): string[] {
  return lessonFiles().map((l) => l.slug);
}

export function findLesson(slug: string): LessonFile | undefined {
  return lessonFiles().find((l) => l.slug === slug);
}

/** The table of contents, read from the lesson's own ## and ### headings. */
export function lessonHeadings(file: string): Heading[] {
  const text = fs.readFileSync(path.join(DIR, file), "utf8");
  const headings: Heading[] = [];
  let inFence = false;
  for (const line of text.split("\n")) {
    if (line.startsWith("```")) inFence = !inFence;
    const match = !inFence && /^(##|###) (.+?)\s*$/.exec(line);
    if (match) headings.push({ depth: match[1].length as 2 | 3, text: match[2].replace(/[`*_]/g, ""), id: headingId(match[2]) });
  }
  return headings;
}
