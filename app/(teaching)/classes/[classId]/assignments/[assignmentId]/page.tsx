import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AssignmentActions } from "@/components/assignments/assignment-actions";
import { ExtensionsPanel } from "@/components/assignments/extensions-panel";
import { StatusBadge } from "@/components/assignments/status-badge";
import { Alert } from "@/components/ui/alert";
import { LocalTime } from "@/components/ui/local-time";
import { MarkdownText } from "@/components/ui/markdown";
import { requireRole } from "@/lib/auth/session";
import { listExtensions } from "@/lib/assignments/extensions";
import { REVEAL_LABELS, TOLERANCE_LABELS, latePolicyText, pluralize } from "@/lib/assignments/teacher-format";
import { duplicateTargets, getTeacherAssignment } from "@/lib/assignments/teacher-views";
import { classStudents } from "@/lib/classes/roster";
import { idFrom, orPage } from "../guard";
import { ScrollRegion } from "@/components/ui/scroll-region";

export const metadata: Metadata = { title: "Assignment" };

export default async function AssignmentOverviewPage({ params, searchParams }: PageProps<"/classes/[classId]/assignments/[assignmentId]">) {
  const user = await requireRole("instructor", "admin");
  const [{ classId, assignmentId }, query] = await Promise.all([params, searchParams]);
  const a = await orPage(getTeacherAssignment(user, idFrom(assignmentId)));
  if (a.classId !== idFrom(classId)) notFound();
  const [extensions, students, targets] = await Promise.all([listExtensions(user, a.id), orPage(classStudents(user, a.classId)), duplicateTargets(user)]);
  const published = typeof query.published === "string" ? Number(query.published) : null;

  return (
    <div className="space-y-8">
      <nav aria-label="Breadcrumb" className="text-sm" data-chrome>
        <Link href="/classes">Classes</Link> <span aria-hidden="true">/</span> <Link href={`/classes/${a.classId}`}>{a.className}</Link> <span aria-hidden="true">/</span>{" "}
        <Link href={`/classes/${a.classId}/assignments`}>Assignments</Link> <span aria-hidden="true">/</span> <span>{a.title}</span>
      </nav>
      <header className="space-y-4">
        <div className="space-y-1">
          <div className="flex flex-wrap items-center gap-3">
            <h1 className="text-2xl">{a.title}</h1>
            <StatusBadge status={a.status} everPublished={a.locked} />
          </div>
          <p className="text-ink-soft">
            {a.className} · {pluralize(a.problemCount, "problem")} · {pluralize(a.totalPoints, "point")}
          </p>
        </div>
        {query.saved ? <Alert tone="success">Saved.</Alert> : null}
        {published !== null && Number.isFinite(published) ? <Alert tone="success">Published. {pluralize(published, "student")} e-mailed.</Alert> : null}
        <AssignmentActions assignment={a} targets={targets} />
      </header>

      <section aria-labelledby="settings-heading" className="space-y-3">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <h2 id="settings-heading" className="text-xl">
            Settings
          </h2>
          <div className="flex flex-wrap gap-2" data-chrome>
            {a.status === "published" ? (
              <Link href={`/classes/${a.classId}/assignments/${a.id}/worksheets`} className="btn-quiet">
                Print worksheets
              </Link>
            ) : null}
            {a.locked ? (
              <Link href={`/classes/${a.classId}/assignments/${a.id}/students`} className="btn-quiet">
                Student work →
              </Link>
            ) : null}
          </div>
        </div>
        <dl className="card grid gap-x-6 gap-y-3 p-4 sm:grid-cols-2 lg:grid-cols-3">
          <div>
            <dt className="text-sm text-ink-faint">Opens</dt>
            <dd className="font-semibold"><LocalTime iso={a.opensAt} /></dd>
          </div>
          <div>
            <dt className="text-sm text-ink-faint">Due</dt>
            <dd className="font-semibold"><LocalTime iso={a.dueAt} /></dd>
          </div>
          <div>
            <dt className="text-sm text-ink-faint">Late work</dt>
            <dd>
              {a.latePolicy === "until" && a.lateUntil ? (
                <>Taken until <LocalTime iso={a.lateUntil} />, full credit</>
              ) : (
                latePolicyText({ latePolicy: a.latePolicy, latePenaltyPercent: a.latePenaltyPercent, lateUntilText: null })
              )}
            </dd>
          </div>
          <div>
            <dt className="text-sm text-ink-faint">Tries per problem</dt>
            <dd className="measure font-semibold">{a.attemptsAllowed}</dd>
          </div>
          <div>
            <dt className="text-sm text-ink-faint">Answers and worked solutions</dt>
            <dd>{REVEAL_LABELS[a.reveal]}</dd>
          </div>
          <div>
            <dt className="text-sm text-ink-faint">{a.publishedAt ? "First published" : "Published"}</dt>
            <dd>{a.publishedAt ? <LocalTime iso={a.publishedAt} /> : "Not yet"}</dd>
          </div>
        </dl>
        {a.instructions.trim() ? (
          <div className="card p-4">
            <h3 className="mb-2 text-sm font-semibold text-ink-faint">Instructions</h3>
            <MarkdownText text={a.instructions} />
          </div>
        ) : null}
      </section>

      <section aria-labelledby="items-heading" className="space-y-3">
        <h2 id="items-heading" className="text-xl">
          Problems
        </h2>
        <ScrollRegion labelledBy="items-caption">
          <table className="w-full text-left text-sm" data-items>
            <caption id="items-caption" className="sr-only">Items of this assignment</caption>
            <thead className="border-b border-rule bg-paper-sunk">
              <tr>
                <th scope="col" className="hidden px-3 py-2 sm:table-cell">#</th>
                <th scope="col" className="px-3 py-2">Kind</th>
                <th scope="col" className="hidden px-3 py-2 sm:table-cell">Level</th>
                <th scope="col" className="hidden px-3 py-2 sm:table-cell">Tolerance</th>
                <th scope="col" className="px-3 py-2 text-right">Points</th>
              </tr>
            </thead>
            <tbody>
              {a.items.map((item) => (
                <tr key={item.id} className="border-b border-rule align-top last:border-0">
                  <td className="measure hidden px-3 py-2 sm:table-cell">{item.position}</td>
                  <th scope="row" className="px-3 py-2 font-semibold">
                    {item.kindTitle}
                    <span className="block text-xs font-normal text-ink-soft">{item.skillTitle}</span>
                    <span className="block text-xs font-normal text-ink-soft sm:hidden">
                      Level {item.level} — {item.levelLabel} · {item.problemCount} × {item.points} points
                    </span>
                  </th>
                  <td className="hidden px-3 py-2 sm:table-cell">
                    {item.level} — {item.levelLabel}
                  </td>
                  <td className="hidden px-3 py-2 sm:table-cell">{TOLERANCE_LABELS[item.tolerance]}</td>
                  <td className="measure px-3 py-2 text-right whitespace-nowrap">
                    <span className="hidden sm:inline">
                      {item.problemCount} × {item.points} ={" "}
                    </span>
                    <strong>{item.problemCount * item.points}</strong>
                  </td>
                </tr>
              ))}
            </tbody>
            <tfoot>
              <tr className="border-t border-rule-strong">
                <th scope="row" colSpan={4} className="hidden px-3 py-2 text-right sm:table-cell">
                  Total
                </th>
                <th scope="row" className="px-3 py-2 text-right sm:hidden">
                  Total
                </th>
                <td className="measure px-3 py-2 text-right font-bold">{a.totalPoints}</td>
              </tr>
            </tfoot>
          </table>
        </ScrollRegion>
      </section>

      <section aria-labelledby="extensions-heading" className="space-y-3">
        <h2 id="extensions-heading" className="text-xl">
          Extensions
        </h2>
        <p className="max-w-prose text-sm text-ink-soft">For accommodations: one student gets a later due date, more tries per problem, or both. Late-work rules count from their own due date.</p>
        <ExtensionsPanel assignmentId={a.id} roster={students} initial={extensions} dueAt={a.dueAt} attemptsAllowed={a.attemptsAllowed} />
      </section>
    </div>
  );
}
