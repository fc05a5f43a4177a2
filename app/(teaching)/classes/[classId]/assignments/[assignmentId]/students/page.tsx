import type { Metadata } from "next";
import Link from "next/link";
import { SubmissionsTable, type SubmissionSort } from "@/components/assignments/submissions-table";
import { LocalTime } from "@/components/ui/local-time";
import { scoresForAssignment } from "@/lib/assignments/scores";
import { classNameOf } from "@/lib/assignments/student-review";
import { WORK_STATUSES, WORK_STATUS_TEXT } from "@/lib/assignments/student-status";
import { requireRole } from "@/lib/auth/session";
import { teacherAssignmentOr404 } from "./load";

export const metadata: Metadata = { title: "Student work" };

export default async function SubmissionsPage({ params, searchParams }: PageProps<"/classes/[classId]/assignments/[assignmentId]/students">) {
  const user = await requireRole("instructor", "admin");
  const [{ classId, assignmentId }, query] = await Promise.all([params, searchParams]);
  const assignment = await teacherAssignmentOr404(user, classId, assignmentId);
  const [all, className] = await Promise.all([scoresForAssignment(assignment), classNameOf(assignment.classId)]);

  const q = typeof query.q === "string" ? query.q.trim().toLowerCase() : "";
  const sort: SubmissionSort = { key: query.sort === "score" ? "score" : "name", dir: query.dir === "desc" ? "desc" : "asc" };
  const shown = all
    .filter((r) => !q || r.name.toLowerCase().includes(q) || r.email.includes(q))
    .sort((a, b) => {
      const order = sort.key === "score" ? a.earned - b.earned || a.name.localeCompare(b.name) : a.name.localeCompare(b.name);
      return sort.dir === "asc" ? order : -order;
    });
  const base = `/classes/${assignment.classId}/assignments/${assignment.id}/students`;
  const sortHref = (s: SubmissionSort) => `${base}?${new URLSearchParams({ ...(q ? { q } : {}), sort: s.key, dir: s.dir })}`;
  const counts = WORK_STATUSES.map((s) => ({ status: s, count: all.filter((r) => r.status === s).length })).filter((c) => c.count > 0);
  const mean = all.length > 0 ? Math.round((all.reduce((sum, r) => sum + r.percent, 0) / all.length) * 10) / 10 : null;

  return (
    <div className="space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link href="/classes">Classes</Link> <span aria-hidden="true">/</span> <Link href={`/classes/${assignment.classId}`}>{className}</Link> <span aria-hidden="true">/</span>{" "}
        <Link href={`/classes/${assignment.classId}/assignments/${assignment.id}`}>{assignment.title}</Link> <span aria-hidden="true">/</span> <span>Student work</span>
      </nav>
      <header className="space-y-1">
        <h1 className="text-2xl">Student work: {assignment.title}</h1>
        <p className="text-ink-soft">
          Due <LocalTime iso={assignment.dueAt.toISOString()} /> · {all.length} {all.length === 1 ? "student" : "students"}
          {mean !== null ? ` · class average ${mean}%` : ""}
        </p>
        {counts.length > 0 ? (
          <p className="text-sm text-ink-soft" data-status-counts>
            {counts.map((c) => `${c.count} ${WORK_STATUS_TEXT[c.status].toLowerCase()}`).join(" · ")}
          </p>
        ) : null}
      </header>

      <section aria-labelledby="work-heading" className="space-y-3">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <h2 id="work-heading" className="text-xl">
            Students
          </h2>
          <form role="search" className="flex gap-2">
            <label htmlFor="work-q" className="sr-only">
              Search students by name or e-mail
            </label>
            <input id="work-q" name="q" defaultValue={q} placeholder="Search name or e-mail" className="input w-56" />
            <input type="hidden" name="sort" value={sort.key} />
            <input type="hidden" name="dir" value={sort.dir} />
            <button className="btn-quiet" type="submit">
              Search
            </button>
          </form>
        </div>
        {all.length === 0 ? (
          <p className="card p-4 text-ink-soft">No students are in this class yet. Their work shows here once they join and start.</p>
        ) : shown.length === 0 ? (
          <p className="card p-4 text-ink-soft">
            No student matches “{q}”. <Link href={base}>Show everyone</Link>
          </p>
        ) : (
          <SubmissionsTable rows={shown} sort={sort} sortHref={sortHref} studentHref={(id) => `${base}/${id}`} caption={`Work on ${assignment.title}, one row per student`} />
        )}
      </section>
    </div>
  );
}
