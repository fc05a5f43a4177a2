import type { Metadata } from "next";
import Link from "next/link";
import { StatusBadge } from "@/components/assignments/status-badge";
import { Alert } from "@/components/ui/alert";
import { LocalTime } from "@/components/ui/local-time";
import { requireRole } from "@/lib/auth/session";
import { pluralize } from "@/lib/assignments/teacher-format";
import { listClassAssignments } from "@/lib/assignments/teacher-views";
import { idFrom, orPage } from "./guard";
import { ScrollRegion } from "@/components/ui/scroll-region";

export const metadata: Metadata = { title: "Assignments" };

export default async function AssignmentsPage({ params, searchParams }: PageProps<"/classes/[classId]/assignments">) {
  const user = await requireRole("instructor", "admin");
  const [{ classId }, query] = await Promise.all([params, searchParams]);
  const id = idFrom(classId);
  const page = Math.max(1, Number(query.page) || 1);
  const { klass, assignments, pageCount, total, page: current } = await orPage(listClassAssignments(user, id, page));
  const newHref = `/classes/${id}/assignments/new`;

  return (
    <div className="space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm" data-chrome>
        <Link href="/classes">Classes</Link> <span aria-hidden="true">/</span> <Link href={`/classes/${id}`}>{klass.name}</Link> <span aria-hidden="true">/</span> <span>Assignments</span>
      </nav>
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl">Assignments</h1>
          <p className="text-ink-soft">
            {klass.name} · {klass.term} · {pluralize(klass.activeStudents, "active student")}
          </p>
        </div>
        {total > 0 ? (
          <Link href={newHref} className="btn-primary" data-chrome>
            Build an assignment
          </Link>
        ) : null}
      </header>
      {query.deleted ? <Alert tone="success">The draft was deleted.</Alert> : null}

      {total === 0 ? (
        <section className="card space-y-3 p-6" aria-labelledby="empty-heading">
          <h2 id="empty-heading" className="text-xl">
            No assignments yet
          </h2>
          <p className="max-w-prose text-ink-soft">
            Build the first one from the practice problem kinds — battens, marks, cut lists, stairs. Each student gets their own numbers, graded the same way as practice. Save it as a draft
            until it is ready; publishing e-mails the class.
          </p>
          <Link href={newHref} className="btn-primary">
            Build the first assignment
          </Link>
        </section>
      ) : (
        <>
          <ScrollRegion labelledBy="assignments-caption">
            <table className="w-full text-left text-sm" data-assignments>
              <caption id="assignments-caption" className="sr-only">Assignments in {klass.name}, latest due first</caption>
              <thead className="border-b border-rule bg-paper-sunk">
                <tr>
                  <th scope="col" className="px-4 py-2">Assignment</th>
                  <th scope="col" className="px-4 py-2">Status</th>
                  <th scope="col" className="hidden px-4 py-2 sm:table-cell">Due</th>
                  <th scope="col" className="hidden px-4 py-2 md:table-cell">Problems</th>
                  <th scope="col" className="hidden px-4 py-2 md:table-cell">Points</th>
                  <th scope="col" className="px-4 py-2"><span className="sr-only">Actions</span></th>
                </tr>
              </thead>
              <tbody>
                {assignments.map((a) => (
                  <tr key={a.id} className="border-b border-rule align-top last:border-0" data-assignment={a.id}>
                    <th scope="row" className="px-4 py-3 font-semibold">
                      <Link href={`/classes/${id}/assignments/${a.id}`}>{a.title}</Link>
                      <span className="block text-xs font-normal text-ink-soft sm:hidden">
                        Due <LocalTime iso={a.dueAt} />
                      </span>
                      <span className="block text-xs font-normal text-ink-soft md:hidden">
                        {pluralize(a.problemCount, "problem")} · {pluralize(a.totalPoints, "point")}
                      </span>
                    </th>
                    <td className="px-4 py-3">
                      <StatusBadge status={a.status} everPublished={a.publishedAt !== null} />
                    </td>
                    <td className="hidden px-4 py-3 sm:table-cell">
                      <LocalTime iso={a.dueAt} />
                    </td>
                    <td className="measure hidden px-4 py-3 md:table-cell">
                      {a.problemCount} <span className="font-sans text-ink-soft">in {pluralize(a.itemCount, "item")}</span>
                    </td>
                    <td className="measure hidden px-4 py-3 md:table-cell">{a.totalPoints}</td>
                    <td className="px-4 py-3 text-right">
                      <Link href={`/classes/${id}/assignments/${a.id}/edit`} className="btn-quiet min-h-9 px-3 text-sm" data-chrome>
                        Edit<span className="sr-only"> {a.title}</span>
                      </Link>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </ScrollRegion>
          {pageCount > 1 ? (
            <nav aria-label="Pages of assignments" className="flex flex-wrap items-center gap-3" data-chrome>
              {current > 1 ? (
                <Link className="btn-quiet" href={`/classes/${id}/assignments?page=${current - 1}`}>
                  ← Later due
                </Link>
              ) : null}
              <span className="text-sm text-ink-soft">
                Page {current} of {pageCount}
              </span>
              {current < pageCount ? (
                <Link className="btn-quiet" href={`/classes/${id}/assignments?page=${current + 1}`}>
                  Earlier due →
                </Link>
              ) : null}
            </nav>
          ) : null}
        </>
      )}
    </div>
  );
}
