"use client";

import useSWR from "swr";
import type { StudentAssignmentView } from "@/lib/assignments/work";
import { ProblemWorkspace } from "@/components/practice/problem-workspace";
import { LateFlag, StudentStatusBadge } from "./student-status-badge";

async function fetchWork(url: string): Promise<StudentAssignmentView> {
  const res = await fetch(url);
  if (!res.ok) throw new Error("Could not refresh your progress.");
  return (await res.json()).work;
}

/**
 * The student's problems and their standing. Each problem keeps its own state as it is answered;
 * the progress and score above them refresh from the server after every try.
 */
export function WorkClient({ initial }: { initial: StudentAssignmentView }) {
  const url = `/api/assignments/${initial.assignment.id}/work`;
  const { data, mutate, error } = useSWR(url, fetchWork, { fallbackData: initial, revalidateOnFocus: true, revalidateOnMount: false });
  const view = data ?? initial;
  const { progress, score } = view;
  const share = progress.total > 0 ? Math.round((progress.finished / progress.total) * 100) : 0;

  return (
    <div className="space-y-8">
      <section aria-labelledby="progress-heading" className="card space-y-3 p-4" data-progress>
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 id="progress-heading" className="text-lg">
            Your progress
          </h2>
          <span className="flex items-center gap-2">
            <StudentStatusBadge status={view.status} />
            {view.late ? <LateFlag /> : null}
          </span>
        </div>
        <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-3">
          <div>
            <dt className="text-ink-faint">Problems finished</dt>
            <dd className="measure text-lg font-semibold" data-finished>
              {progress.finished} of {progress.total}
            </dd>
          </div>
          <div>
            <dt className="text-ink-faint">Score so far</dt>
            <dd className="measure text-lg font-semibold" data-score>
              {score.override?.excused ? (
                "Excused"
              ) : (
                <>
                  {score.earned} / {score.possible} <span className="text-sm font-normal text-ink-soft">({score.percent}%)</span>
                </>
              )}
            </dd>
          </div>
          <div className="col-span-2 sm:col-span-1">
            <dt className="text-ink-faint">Tries per problem</dt>
            <dd className="measure text-lg font-semibold">{view.assignment.attemptsAllowed}</dd>
          </div>
        </dl>
        <div className="h-2 overflow-hidden rounded-full bg-paper-sunk" role="progressbar" aria-label="Problems finished" aria-valuemin={0} aria-valuemax={progress.total} aria-valuenow={progress.finished}>
          <div className="h-full bg-chalk" style={{ width: `${share}%` }} />
        </div>
        {score.override ? (
          <p className="rounded-sm border border-rule-strong bg-paper-raised p-2 text-sm" data-override>
            <strong>{score.override.excused ? "Excused by your instructor." : "Score changed by your instructor."}</strong> Reason: “{score.override.reason}”
          </p>
        ) : null}
        {error ? <p className="text-sm text-danger">{error.message} Your answers are saved; reload the page to see the totals.</p> : null}
      </section>

      {initial.problems.length === 0 ? (
        <p className="card p-4 text-ink-soft">{initial.timing.window === "upcoming" ? "Your problems appear here when the assignment opens." : "This assignment has no problems."}</p>
      ) : (
        <ol className="space-y-10" aria-label="Your problems">
          {initial.problems.map((problem) => (
            <li key={problem.id} className="border-t border-rule pt-6 first:border-t-0 first:pt-0">
              <ProblemWorkspace
                initial={problem}
                signedIn
                headingLevel="h2"
                assignment={{ answerUrl: `/api/assignments/${initial.assignment.id}/problems/${problem.id}/answers`, onAnswered: () => void mutate() }}
              />
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
