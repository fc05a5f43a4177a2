import Link from "next/link";
import type { ClassSummary } from "@/lib/classes/queries";

const SECTIONS = [
  { key: "roster", label: "Roster", path: "" },
  { key: "add", label: "Add students", path: "/add-students" },
  { key: "settings", label: "Settings", path: "/settings" },
] as const;

export type ClassSection = (typeof SECTIONS)[number]["key"];

/** The heading every page of one class shares: where you are, what the class is, and its pages. */
export function ClassHeader({ summary, current, title }: { summary: ClassSummary; current: ClassSection; title?: string }) {
  const base = `/classes/${summary.id}`;
  return (
    <div className="space-y-4">
      <nav aria-label="Breadcrumb" className="text-sm" data-chrome>
        <Link href="/classes">Classes</Link> <span aria-hidden="true">/</span>{" "}
        {title ? (
          <>
            <Link href={base}>{summary.name}</Link> <span aria-hidden="true">/</span> <span>{title}</span>
          </>
        ) : (
          <span>{summary.name}</span>
        )}
      </nav>
      <header className="space-y-1">
        <h1 className="text-2xl">{title ?? summary.name}</h1>
        <p className="text-ink-soft">
          {[summary.term, summary.sectionCode ? `Section ${summary.sectionCode}` : null, `${summary.studentCount} student${summary.studentCount === 1 ? "" : "s"}`, `led by ${summary.instructorName}`]
            .filter(Boolean)
            .join(" · ")}
        </p>
      </header>
      {summary.archivedAt ? (
        <p className="rounded border-l-4 border-caution-edge bg-caution-bg px-4 py-3 font-semibold text-caution">
          This class is archived: it is hidden from the class lists and nobody can join it. Restore it from Settings.
        </p>
      ) : null}
      <nav aria-label="Class pages" className="flex flex-wrap gap-1 border-b border-rule" data-chrome>
        {SECTIONS.map((s) => (
          <Link
            key={s.key}
            href={`${base}${s.path}`}
            aria-current={s.key === current ? "page" : undefined}
            className={`-mb-px border-b-4 px-3 py-2 font-semibold no-underline ${s.key === current ? "border-chalk text-ink" : "border-transparent text-ink-soft hover:border-rule-strong"}`}
          >
            {s.label}
          </Link>
        ))}
      </nav>
    </div>
  );
}
