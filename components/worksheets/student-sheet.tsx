import { ProblemFigureView } from "@/components/practice/problem-figure";
import { MarkdownText } from "@/components/ui/markdown";
import type { StudentWorksheet, WorksheetProblem, WorksheetSet } from "@/lib/worksheets/worksheets";
import { SheetHeading } from "./sheet-heading";

/** One student's paper: their own numbers for every problem, with a line to write each answer on. */
export function StudentSheet({ set, student }: { set: WorksheetSet; student: StudentWorksheet }) {
  return (
    <article className="ws-page card mx-auto max-w-[8.5in] space-y-4 bg-white p-4 shadow-sm sm:p-8" aria-label={`Worksheet for ${student.name}`} data-worksheet={student.studentId}>
      <SheetHeading set={set} name={student.name} dueAt={student.dueAt} kind="worksheet" />
      {set.assignment.instructions.trim() ? <MarkdownText text={set.assignment.instructions} className="text-sm" /> : null}
      <ol className="space-y-5 print:space-y-4">
        {student.problems.map((problem) => (
          <li key={problem.number}>
            <SheetProblem problem={problem} />
          </li>
        ))}
      </ol>
      <p className="border-t border-rule pt-2 text-xs text-ink-soft">Show your work. Measure twice; follow your shop&apos;s rules and local codes.</p>
    </article>
  );
}

function SheetProblem({ problem }: { problem: WorksheetProblem }) {
  return (
    <section className="ws-problem space-y-2" aria-label={`Problem ${problem.number}: ${problem.title}`} data-sheet-problem={problem.number}>
      <h3 className="flex flex-wrap items-baseline justify-between gap-2 text-base">
        <span>
          {problem.number}. {problem.title}
        </span>
        <span className="text-sm font-normal text-ink-soft">
          {problem.points} {problem.points === 1 ? "point" : "points"}
        </span>
      </h3>
      <div className="space-y-2 text-sm leading-relaxed" dangerouslySetInnerHTML={{ __html: problem.promptHtml }} />
      {problem.figure ? (
        <div className="ws-figure mx-auto max-w-xl">
          <ProblemFigureView figure={problem.figure} />
        </div>
      ) : null}
      <div className="grid gap-x-5 gap-y-3 pt-1 sm:grid-cols-2 lg:grid-cols-4 print:grid-cols-4">
        {problem.parts.map((part) => (
          <div key={part.key} className="flex flex-col justify-end text-sm">
            <p className="leading-tight font-semibold">{part.label}</p>
            <div className="ws-answer-line mt-5 border-b border-ink" aria-hidden="true" />
            <p className="text-xs leading-tight text-ink-soft">{part.hint}</p>
          </div>
        ))}
      </div>
    </section>
  );
}
