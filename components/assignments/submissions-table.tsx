import Link from "next/link";
import type { StudentScore } from "@/lib/assignments/scores";
import { LocalTime } from "@/components/ui/local-time";
import { LateFlag, StudentStatusBadge } from "./student-status-badge";
import { ScrollRegion } from "@/components/ui/scroll-region";

export type SubmissionSort = { key: "name" | "score"; dir: "asc" | "desc" };

function SortHeader({ label, column, sort, href }: { label: string; column: SubmissionSort["key"]; sort: SubmissionSort; href: (s: SubmissionSort) => string }) {
  const active = sort.key === column;
  const next: SubmissionSort = { key: column, dir: active && sort.dir === "asc" ? "desc" : active ? "asc" : column === "score" ? "desc" : "asc" };
  return (
    <th scope="col" className="px-3 py-2" aria-sort={active ? (sort.dir === "asc" ? "ascending" : "descending") : "none"}>
      <Link href={href(next)} className="inline-flex items-center gap-1 text-ink no-underline hover:underline">
        {label}
        <span aria-hidden="true" className="text-ink-faint">
          {active ? (sort.dir === "asc" ? "▲" : "▼") : "↕"}
        </span>
        <span className="sr-only">{active ? `, sorted ${sort.dir === "asc" ? "ascending" : "descending"}` : ", sort"}</span>
      </Link>
    </th>
  );
}

/** Every student's standing on one assignment; names link to their work. */
export function SubmissionsTable({ rows, sort, sortHref, studentHref, caption }: { rows: StudentScore[]; sort: SubmissionSort; sortHref: (s: SubmissionSort) => string; studentHref: (id: number) => string; caption: string }) {
  return (
    <ScrollRegion labelledBy="submissions-caption">
      <table className="w-full text-left text-sm">
        <caption id="submissions-caption" className="sr-only">{caption}</caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            <SortHeader label="Student" column="name" sort={sort} href={sortHref} />
            <th scope="col" className="hidden px-3 py-2 sm:table-cell">
              Status
            </th>
            <SortHeader label="Score" column="score" sort={sort} href={sortHref} />
            <th scope="col" className="hidden px-3 py-2 md:table-cell">
              Finished
            </th>
            <th scope="col" className="hidden px-3 py-2 md:table-cell">
              Last activity
            </th>
            <th scope="col" className="hidden px-3 py-2 lg:table-cell">
              Extension
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.studentId} className="border-b border-rule align-top last:border-0" data-student={r.studentId}>
              <th scope="row" className="px-3 py-2 font-semibold">
                <Link href={studentHref(r.studentId)}>{r.name}</Link>
                <span className="hidden text-xs font-normal break-all text-ink-soft sm:block">{r.email}</span>
                <span className="mt-1 block sm:hidden">
                  <StudentStatusBadge status={r.status} />
                </span>
              </th>
              <td className="hidden px-3 py-2 sm:table-cell">
                <StudentStatusBadge status={r.status} />
              </td>
              <td className="px-3 py-2">
                <span className="measure font-semibold whitespace-nowrap" data-score>
                  {r.earned} / {r.possible}
                </span>{" "}
                <span className="whitespace-nowrap text-ink-soft">({r.percent}%)</span> {r.late ? <LateFlag /> : null}
                <span className="block text-xs text-ink-soft md:hidden">
                  {r.finished} of {r.total} finished
                </span>
              </td>
              <td className="measure hidden px-3 py-2 md:table-cell">
                {r.finished} of {r.total}
              </td>
              <td className="hidden px-3 py-2 md:table-cell">{r.lastActivityAt ? <LocalTime iso={r.lastActivityAt} /> : <span className="text-ink-faint">none yet</span>}</td>
              <td className="hidden px-3 py-2 lg:table-cell">
                {r.extension ? (
                  <>
                    {r.extension.dueAt ? (
                      <>
                        due <LocalTime iso={r.extension.dueAt} style="date" />
                      </>
                    ) : null}
                    {r.extension.dueAt && r.extension.extraAttempts > 0 ? ", " : ""}
                    {r.extension.extraAttempts > 0 ? `+${r.extension.extraAttempts} tries` : ""}
                  </>
                ) : (
                  <span className="text-ink-faint">—</span>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
