import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { SubmissionProblem } from "@/components/assignments/submissions-problem";
import { LateFlag, StudentStatusBadge } from "@/components/assignments/student-status-badge";
import { LocalTime } from "@/components/ui/local-time";
import { PhotoReview } from "@/components/uploads/photo-review";
import { classNameOf, studentReview } from "@/lib/assignments/student-review";
import { requireRole } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { listUploads } from "@/lib/uploads/store";
import { teacherAssignmentOr404 } from "../load";

export const metadata: Metadata = { title: "A student's work" };

export default async function StudentWorkPage({ params }: PageProps<"/classes/[classId]/assignments/[assignmentId]/students/[studentId]">) {
  const user = await requireRole("instructor", "admin");
  const { classId, assignmentId, studentId } = await params;
  const assignment = await teacherAssignmentOr404(user, classId, assignmentId);
  const [review, className, photos] = await Promise.all([
    studentReview(assignment, Number(studentId)).catch((error: unknown) => {
      if (error instanceof AppError && error.code === "not_found") notFound();
      throw error;
    }),
    classNameOf(assignment.classId),
    listUploads(user, assignment.id, Number(studentId)).catch((error: unknown) => {
      if (error instanceof AppError && error.code === "not_found") notFound();
      throw error;
    }),
  ]);
  const { student, score, extension } = review;
  const listHref = `/classes/${assignment.classId}/assignments/${assignment.id}/students`;

  return (
    <div className="max-w-4xl space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm" data-chrome>
        <Link href="/classes">Classes</Link> <span aria-hidden="true">/</span> <Link href={`/classes/${assignment.classId}`}>{className}</Link> <span aria-hidden="true">/</span>{" "}
        <Link href={`/classes/${assignment.classId}/assignments/${assignment.id}`}>{assignment.title}</Link> <span aria-hidden="true">/</span> <Link href={listHref}>Student work</Link>{" "}
        <span aria-hidden="true">/</span> <span>{student.name}</span>
      </nav>
      <header className="space-y-2">
        <h1 className="text-2xl">{student.name}</h1>
        <p className="text-ink-soft">
          <span className="break-all">{student.email}</span> · {assignment.title}
          {student.enrollment !== "active" ? <span className="font-semibold text-ink"> · {student.enrollment === "removed" ? "removed from the class (work kept)" : student.enrollment}</span> : null}
        </p>
      </header>

      <section aria-labelledby="summary-heading" className="card space-y-3 p-4">
        <h2 id="summary-heading" className="sr-only">
          Summary
        </h2>
        <div className="flex flex-wrap items-center gap-2">
          {score.status ? <StudentStatusBadge status={score.status} /> : null}
          {score.late ? <LateFlag /> : null}
        </div>
        <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-4">
          <div>
            <dt className="text-ink-faint">Score</dt>
            <dd className="measure text-lg font-semibold" data-score>
              {score.earned} / {score.possible} <span className="text-sm font-normal text-ink-soft">({score.percent}%)</span>
            </dd>
          </div>
          <div>
            <dt className="text-ink-faint">Finished</dt>
            <dd className="measure text-lg font-semibold">
              {score.finished} of {score.total}
            </dd>
          </div>
          <div>
            <dt className="text-ink-faint">Due for this student</dt>
            <dd className="font-semibold">
              <LocalTime iso={review.assignment.dueAt} />
            </dd>
          </div>
          <div>
            <dt className="text-ink-faint">Last activity</dt>
            <dd className="font-semibold">{score.lastActivityAt ? <LocalTime iso={score.lastActivityAt} /> : "none yet"}</dd>
          </div>
        </dl>
        <p className="text-sm text-ink-soft" data-extension>
          {extension
            ? `Extension: ${[extension.dueAt ? "new due date above" : null, extension.extraAttempts > 0 ? `${extension.extraAttempts} extra ${extension.extraAttempts === 1 ? "try" : "tries"} per problem` : null].filter(Boolean).join(", ")}${extension.note ? ` — “${extension.note}”` : ""}.`
            : "No extension."}{" "}
          Tries allowed per problem: {review.assignment.attemptsAllowed}.
        </p>
      </section>

      <PhotoReview assignmentId={assignment.id} studentId={student.id} initial={photos} />

      <section aria-labelledby="problems-heading" className="space-y-4">
        <h2 id="problems-heading" className="text-xl">
          Problems and answers
        </h2>
        {review.problems.length === 0 ? (
          <p className="card p-4 text-ink-soft">{student.name} has not opened this assignment yet, so no problems have been made for them.</p>
        ) : (
          <ol className="space-y-4">
            {review.problems.map((p) => (
              <li key={p.id}>
                <SubmissionProblem problem={p} />
              </li>
            ))}
          </ol>
        )}
      </section>
    </div>
  );
}
