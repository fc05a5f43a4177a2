import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { LateFlag, StudentStatusBadge } from "@/components/assignments/student-status-badge";
import { LocalTime } from "@/components/ui/local-time";
import { studentClass } from "@/lib/assignments/student-classes";
import { requireUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";

export const metadata: Metadata = { title: "Class" };

const WINDOW_NOTE = { upcoming: "Not open yet", open: null, "late-window": "Past due · late work taken", closed: "Closed" } as const;

export default async function StudentClassPage({ params }: PageProps<"/my-classes/[classId]">) {
  const user = await requireUser();
  const { classId } = await params;
  const view = await studentClass(user, Number(classId)).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });

  return (
    <div className="space-y-6">
      <nav aria-label="Breadcrumb" data-chrome className="text-sm">
        <Link href="/my-classes">My classes</Link> <span aria-hidden="true">/</span> <span>{view.name}</span>
      </nav>
      <header className="space-y-1">
        <h1 className="text-2xl">{view.name}</h1>
        <p className="text-ink-soft">
          {view.term}
          {view.instructorName ? ` · ${view.instructorName}` : ""}
        </p>
      </header>

      <section aria-labelledby="assignments-heading" className="space-y-3">
        <h2 id="assignments-heading" className="text-xl">
          Assignments
        </h2>
        {view.assignments.length === 0 ? (
          <div className="card space-y-1 p-6">
            <p className="font-semibold">No assignments yet.</p>
            <p className="text-ink-soft">
              When your instructor hands one out it shows here, with its due date. Meanwhile, <Link href="/practice">practice</Link> keeps your layout math sharp.
            </p>
          </div>
        ) : (
          <ul className="space-y-3">
            {view.assignments.map((a) => (
              <li key={a.id} className="card p-4" data-assignment={a.id}>
                <div className="flex flex-wrap items-start justify-between gap-x-4 gap-y-2">
                  <div className="min-w-0 space-y-1">
                    <h3 className="text-lg">
                      <Link href={`/my-classes/${view.id}/assignments/${a.id}`} className="text-ink">
                        {a.title}
                      </Link>
                    </h3>
                    <p className="text-sm text-ink-soft">
                      {a.window === "upcoming" ? (
                        <>
                          Opens <LocalTime iso={a.opensAt} style="weekday" />
                          {" · "}
                        </>
                      ) : null}
                      Due <LocalTime iso={a.dueAt} style="weekday" />
                      {a.originalDueAt ? <span className="font-semibold text-ink"> (your extension)</span> : null}
                      {WINDOW_NOTE[a.window] ? ` · ${WINDOW_NOTE[a.window]}` : ""}
                    </p>
                  </div>
                  <div className="flex items-center gap-2">
                    <StudentStatusBadge status={a.status} />
                    {a.late ? <LateFlag /> : null}
                  </div>
                </div>
                <dl className="mt-3 flex flex-wrap gap-x-6 gap-y-1 text-sm">
                  <div className="flex gap-1">
                    <dt className="text-ink-faint">Score</dt>
                    <dd className="measure font-semibold" data-score>
                      {a.override?.excused ? "Excused" : `${a.earned} / ${a.possible} (${a.percent}%)`}
                    </dd>
                  </div>
                  {a.override ? (
                    <div className="w-full">
                      <dt className="sr-only">Note</dt>
                      <dd className="text-ink-soft" data-override>
                        {a.override.excused ? "Excused" : "Score changed"} by your instructor: “{a.override.reason}”
                      </dd>
                    </div>
                  ) : null}
                  <div className="flex gap-1">
                    <dt className="text-ink-faint">Finished</dt>
                    <dd className="measure font-semibold">
                      {a.finished} of {a.total}
                    </dd>
                  </div>
                </dl>
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
