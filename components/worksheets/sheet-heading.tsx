import { LocalTime } from "@/components/ui/local-time";
import type { WorksheetSet } from "@/lib/worksheets/worksheets";

/** The top of every printed page: school and class, the student, the assignment and its due date. */
export function SheetHeading({ set, name, dueAt, kind }: { set: WorksheetSet; name: string; dueAt: string; kind: "worksheet" | "key" }) {
  const { schoolClass, assignment } = set;
  const classLine = [schoolClass.name, schoolClass.sectionCode ? `Section ${schoolClass.sectionCode}` : null, schoolClass.term].filter(Boolean).join(" · ");
  return (
    <header className="space-y-2 border-b-2 border-ink pb-2">
      <p className="text-sm">{schoolClass.program ? `${schoolClass.program} — ${classLine}` : classLine}</p>
      <div className="flex flex-wrap items-baseline justify-between gap-x-4">
        <h2 className="text-xl leading-tight">{assignment.title}</h2>
        <p className={`text-sm ${kind === "key" ? "font-bold tracking-wide uppercase" : "text-ink-soft"}`}>{kind === "key" ? "Answer key — instructor's copy" : "Worksheet"}</p>
      </div>
      <dl className="flex flex-wrap gap-x-8 gap-y-1 text-sm">
        <div className="flex gap-2">
          <dt className="text-ink-soft">Name</dt>
          <dd className="font-semibold" data-student-name>
            {name}
          </dd>
        </div>
        <div className="flex gap-2">
          <dt className="text-ink-soft">Due</dt>
          <dd className="font-semibold">
            <LocalTime iso={dueAt} />
          </dd>
        </div>
        <div className="flex gap-2">
          <dt className="text-ink-soft">Points</dt>
          <dd className="measure font-semibold">{assignment.points}</dd>
        </div>
      </dl>
    </header>
  );
}
