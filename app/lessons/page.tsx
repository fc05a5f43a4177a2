import type { Metadata } from "next";
import Link from "next/link";
import { LessonMasteryBadge } from "@/components/lessons/mastery-client";
import { LessonProgressBadge, ProgressPrompt } from "@/components/lessons/progress-client";
import { courseOutline } from "@/lib/lessons/load";

export const metadata: Metadata = { title: "Lessons" };

export default async function LessonsPage() {
  const lessons = await courseOutline();
  const total = lessons.reduce((n, l) => n + l.minutes, 0);
  return (
    <div className="space-y-6">
      <header className="max-w-prose space-y-2">
        <h1 className="text-2xl">Lessons</h1>
        <p className="text-ink-soft">
          A first-term course in layout math: {lessons.length} short lessons, about {Math.round(total / 5) * 5} minutes in all. Each one works
          the numbers with a live calculator and ends with practice questions.
        </p>
        <ProgressPrompt />
      </header>
      <ol className="space-y-3">
        {lessons.map((lesson) => (
          <li key={lesson.slug} className="card flex gap-4 p-4">
            <span aria-hidden="true" className="measure grid size-10 shrink-0 place-items-center rounded-full bg-ink font-bold text-paper">
              {lesson.order}
            </span>
            <div className="min-w-0 flex-1">
              <h2 className="text-lg">
                <Link href={`/lessons/${lesson.slug}`}>{lesson.title}</Link>
              </h2>
              <p className="text-ink-soft">{lesson.summary}</p>
              <p className="mt-1 flex flex-wrap items-center gap-3 text-sm text-ink-faint">
                <span>{lesson.minutes} min</span>
                <LessonProgressBadge slug={lesson.slug} />
                <LessonMasteryBadge skill={lesson.skill} />
              </p>
            </div>
          </li>
        ))}
      </ol>
    </div>
  );
}
