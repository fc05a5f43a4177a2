import Link from "next/link";
import type { ClassSummary } from "@/lib/classes/queries";

export function ClassCard({ summary, href }: { summary: ClassSummary; href?: string }) {
  const title = href ? (
    <Link href={href} className="text-ink">
      {summary.name}
    </Link>
  ) : (
    summary.name
  );
  return (
    <article className="card flex flex-col gap-3 p-5">
      <div>
        <h2 className="text-lg">{title}</h2>
        <p className="text-sm text-ink-soft">
          {summary.term}
          {summary.program ? ` · ${summary.program}` : ""}
        </p>
      </div>
      <dl className="grid grid-cols-2 gap-2 text-sm">
        <div>
          <dt className="text-ink-faint">Instructor</dt>
          <dd className="font-semibold">{summary.instructorName}</dd>
        </div>
        <div>
          <dt className="text-ink-faint">Students</dt>
          <dd className="measure font-semibold">{summary.studentCount}</dd>
        </div>
        {summary.joinCode ? (
          <div className="col-span-2">
            <dt className="text-ink-faint">Join code</dt>
            <dd className="measure text-lg font-bold tracking-widest">{summary.joinCode}</dd>
          </div>
        ) : null}
      </dl>
    </article>
  );
}
