import type { AssignmentProblemView } from "@/lib/assignments/work";
import { PreviousTries } from "@/components/practice/previous-tries";
import { ProblemFigureView } from "@/components/practice/problem-figure";

const STATE = { open: "Open", solved: "Solved", failed: "Out of tries" } as const;

/** One of a student's variants as their instructor reviews it: prompt, answers, every try, points. */
export function SubmissionProblem({ problem }: { problem: AssignmentProblemView }) {
  return (
    <article className="card space-y-3 p-4" aria-labelledby={`review-${problem.id}`} data-problem={problem.kind} data-status={problem.status}>
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <div>
          <p className="text-sm text-ink-faint">
            Problem {problem.number} · {problem.skillTitle} · Level {problem.level}
          </p>
          <h3 id={`review-${problem.id}`} className="text-lg">
            {problem.title}
          </h3>
        </div>
        <p className="text-sm">
          <span className="font-semibold">{STATE[problem.status]}</span> · {problem.attemptsUsed} of {problem.attemptsAllowed} tries ·{" "}
          <span className="measure font-semibold" data-points>
            {problem.earned} / {problem.points}
          </span>{" "}
          points
        </p>
      </header>
      <details>
        <summary className="cursor-pointer text-sm font-semibold">The problem as the student saw it</summary>
        <div className="mt-2 space-y-3 leading-relaxed">
          <div className="space-y-3" dangerouslySetInnerHTML={{ __html: problem.promptHtml }} />
          {problem.figure ? <ProblemFigureView figure={problem.figure} /> : null}
        </div>
      </details>
      {problem.final ? (
        <div className="space-y-1">
          <h4 className="text-sm font-semibold">Answers</h4>
          <dl className="grid gap-2 text-sm sm:grid-cols-2">
            {problem.parts.map((p) => (
              <div key={p.key} className="rounded border border-rule bg-paper p-2">
                <dt className="text-ink-soft">{p.label}</dt>
                <dd className="measure font-semibold" data-expected={p.key}>
                  {problem.final!.expected[p.key]}
                </dd>
              </div>
            ))}
          </dl>
        </div>
      ) : null}
      {problem.tries.length > 0 ? <PreviousTries tries={problem.tries} showSlips /> : <p className="text-sm text-ink-faint">No tries yet.</p>}
    </article>
  );
}
