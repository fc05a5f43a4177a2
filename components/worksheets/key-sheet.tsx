import type { StudentWorksheet, WorksheetSet } from "@/lib/worksheets/worksheets";
import { SheetHeading } from "./sheet-heading";

/** One student's answers and worked steps, for the instructor marking that student's paper. */
export function KeySheet({ set, student }: { set: WorksheetSet; student: StudentWorksheet }) {
  return (
    <article className="ws-page card mx-auto max-w-[8.5in] space-y-4 bg-white p-4 shadow-sm sm:p-8" aria-label={`Answer key for ${student.name}`} data-answer-key={student.studentId}>
      <SheetHeading set={set} name={student.name} dueAt={student.dueAt} kind="key" />
      <ol className="space-y-4">
        {(student.key ?? []).map((problem) => (
          <li key={problem.number} className="ws-key-problem space-y-2">
            <h3 className="text-base">
              {problem.number}. {problem.title}
            </h3>
            <dl className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2 print:grid-cols-2">
              {problem.answers.map((answer) => (
                <div key={answer.key} className="flex flex-wrap items-baseline justify-between gap-x-3 border-b border-rule py-0.5">
                  <dt className="text-ink-soft">{answer.label}</dt>
                  <dd>
                    <span className="measure font-semibold" data-expected={answer.key}>
                      {answer.expected}
                    </span>{" "}
                    <span className="text-xs text-ink-soft">({answer.accepts})</span>
                  </dd>
                </div>
              ))}
            </dl>
            <div className="text-sm">
              <h4 className="font-semibold">Worked steps</h4>
              <ol className="mt-1 list-decimal space-y-0.5 pl-6 leading-snug">
                {problem.stepsHtml.map((step, i) => (
                  <li key={i} dangerouslySetInnerHTML={{ __html: step }} />
                ))}
              </ol>
            </div>
          </li>
        ))}
      </ol>
    </article>
  );
}
