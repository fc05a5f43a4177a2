import Link from "next/link";
import type { ClassSummary } from "@/lib/classes/queries";
import { formatJoinCode } from "@/lib/classes/schemas";

function termLine(summary: ClassSummary): string {
  return [summary.term, summary.sectionCode ? `Section ${summary.sectionCode}` : null, summary.program].filter(Boolean).join(" · ");
}

/** A class in a list: the instructor's view links to the roster, the student's to their assignments. */
export function ClassCard({ summary, href }: { summary: ClassSummary; href?: string }) {
  const forStudent = summary.myRole === "student";
  const title = href ? (
    <Link href={href} className="text-ink">
      {summary.name}
    </Link>
  ) : (
    summary.name
  );
  return (
    <article className="card flex h-full flex-col gap-3 p-5">
      <div>
        <h2 className="text-lg">{title}</h2>
        <p className="text-sm text-ink-soft">{termLine(summary)}</p>
      </div>
      <dl className="grid grid-cols-2 gap-2 text-sm">
        <div>
          <dt className="text-ink-faint">Instructor</dt>
          <dd className="font-semibold">{summary.instructorName}</dd>
        </div>
        <div>
          <dt className="text-ink-faint">Students</dt>
          <dd className="measure font-semibold">
            {summary.studentCount}
            {!forStudent && summary.invitedCount > 0 ? <span className="font-normal text-ink-soft"> + {summary.invitedCount} invited</span> : null}
          </dd>
        </div>
        {summary.joinCode ? (
          <div className="col-span-2">
            <dt className="text-ink-faint">Join code</dt>
            <dd className="measure text-lg font-bold tracking-widest">{formatJoinCode(summary.joinCode)}</dd>
          </div>
        ) : null}
      </dl>
      {forStudent && href ? (
        <p className="mt-auto text-sm">
          <Link href={href}>Assignments, due dates and scores</Link>
        </p>
      ) : null}
    </article>
  );
}
