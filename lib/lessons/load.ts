import "server-only";
import type { ComponentType } from "react";
import { lessonFiles, type LessonFile } from "./catalog";

export type LessonSource = { title: string; note?: string; url?: string };
export type LessonMeta = { title: string; summary: string; skill: string; order: number; minutes: number; sources: LessonSource[] };
export type LessonModule = { default: ComponentType; metadata: LessonMeta };
export type LessonSummary = LessonMeta & { slug: string };

export async function loadLesson(lesson: LessonFile): Promise<LessonModule> {
  // A template import: the bundler builds every file in the folder, so each lesson is compiled (and its math rendered) at build time.
  return (await import(`@/content/lessons/${lesson.file}`)) as LessonModule;
}

export async function courseOutline(): Promise<LessonSummary[]> {
  const modules = await Promise.all(lessonFiles().map(async (l) => ({ slug: l.slug, ...(await loadLesson(l)).metadata })));
  return modules.sort((a, b) => a.order - b.order);
}
