import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { LessonTocDisclosure, LessonTocSidebar } from "@/components/lessons/lesson-toc";
import { LessonProgressControls } from "@/components/lessons/progress-client";
import { findLesson, lessonFiles, lessonHeadings } from "@/lib/lessons/catalog";
import { courseOutline, loadLesson } from "@/lib/lessons/load";

// Every lesson is rendered at build time; any other slug is a real 404.
export const dynamicParams = false;

export function generateStaticParams() {
  return lessonFiles().map(({ slug }) => ({ slug }));
}

export async function generateMetadata({ params }: PageProps<"/lessons/[slug]">): Promise<Metadata> {
  const lesson = findLesson((await params).slug);
  if (!lesson) return {};
  const { metadata } = await loadLesson(lesson);
  return { title: metadata.title, description: metadata.summary };
}

export default async function LessonPage({ params }: PageProps<"/lessons/[slug]">) {
  const { slug } = await params;
  const lesson = findLesson(slug);
  if (!lesson) notFound();
  const [{ default: Content, metadata }, outline] = await Promise.all([loadLesson(lesson), courseOutline()]);
  const headings = lessonHeadings(lesson.file);
  const at = outline.findIndex((l) => l.slug === slug);
  const previous = outline[at - 1];
  const next = outline[at + 1];

  return (
    <div className="grid grid-cols-1 gap-8 lg:grid-cols-[minmax(0,1fr)_16rem]">
      <article className="min-w-0 max-w-prose">
        <nav aria-label="Breadcrumb" data-chrome className="text-sm">
          <Link href="/lessons">Lessons</Link> <span aria-hidden="true">/</span> Lesson {metadata.order}
        </nav>
        <header className="mt-2 space-y-2">
          <h1 className="text-3xl">{metadata.title}</h1>
          <p className="text-lg text-ink-soft">{metadata.summary}</p>
          <p className="text-sm text-ink-faint">
            Lesson {metadata.order} of {outline.length} · about {metadata.minutes} minutes
          </p>
        </header>
        <LessonTocDisclosure headings={headings} />
        {/* Markdown's own lists carry no class; a calculator's lists style themselves and must not gain bullets. */}
        <div className="lesson-body mt-6 overflow-x-clip space-y-4 leading-relaxed [&_ol:not([class])]:list-decimal [&_ol:not([class])]:pl-6 [&_ul:not([class])]:list-disc [&_ul:not([class])]:pl-6 [&_:is(ol,ul):not([class])>li]:my-1">
          <Content />
        </div>
        <section aria-labelledby="sources" className="mt-10 border-t border-rule pt-4">
          <h2 id="sources" className="text-xl">
            Sources
          </h2>
          <ul className="mt-2 list-disc space-y-1 pl-6 text-sm">
            {metadata.sources.map((s) => (
              <li key={s.title}>
                {s.title}
                {s.note ? <span className="text-ink-soft"> — {s.note}</span> : null}
              </li>
            ))}
          </ul>
        </section>
        <LessonProgressControls slug={slug} />
        <nav aria-label="Lessons before and after" data-chrome className="mt-8 flex flex-wrap justify-between gap-3">
          {previous ? (
            <Link rel="prev" className="btn-quiet" href={`/lessons/${previous.slug}`}>
              ← {previous.title}
            </Link>
          ) : (
            <span />
          )}
          {next ? (
            <Link rel="next" className="btn-quiet" href={`/lessons/${next.slug}`}>
              {next.title} →
            </Link>
          ) : null}
        </nav>
      </article>
      <LessonTocSidebar headings={headings} />
    </div>
  );
}
