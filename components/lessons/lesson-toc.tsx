import type { Heading } from "@/lib/lessons/catalog";

/*
 * The table of contents comes in two forms from one list. On a phone it is folded into a
 * <details> under the lesson header, so the title and summary come first and the list costs one
 * line until asked for; from the lg breakpoint it is a sticky side column. Each form is hidden
 * (display: none) at the other size, so a reader, a screen reader and the tab order only ever meet
 * one of them. Both are chrome: a printed lesson has no use for links to its own sections.
 */

function TocLinks({ headings, roomy }: { headings: Heading[]; roomy: boolean }) {
  // On a touchscreen each link gets a full-width target a thumb can hit.
  const link = roomy ? "block py-1.5" : undefined;
  return (
    <ol className={roomy ? "text-base" : "space-y-1 text-sm"}>
      {headings.map((h) => (
        <li key={h.id} className={h.depth === 3 ? "pl-4" : ""}>
          <a className={link} href={`#${h.id}`}>
            {h.text}
          </a>
        </li>
      ))}
      <li>
        <a className={link} href="#sources">
          Sources
        </a>
      </li>
    </ol>
  );
}

export function LessonTocDisclosure({ headings }: { headings: Heading[] }) {
  return (
    <details data-chrome className="card mt-6 lg:hidden">
      <summary className="cursor-pointer rounded-lg px-4 py-3 font-semibold">On this page</summary>
      <nav aria-label="On this page" className="border-t border-rule px-4 py-2">
        <TocLinks headings={headings} roomy />
      </nav>
    </details>
  );
}

export function LessonTocSidebar({ headings }: { headings: Heading[] }) {
  return (
    <aside data-chrome className="hidden lg:block">
      <nav aria-labelledby="toc-title" className="card sticky top-4 max-h-[calc(100dvh-2rem)] overflow-y-auto p-4">
        <p id="toc-title" className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-faint">
          In this lesson
        </p>
        <TocLinks headings={headings} roomy={false} />
      </nav>
    </aside>
  );
}
