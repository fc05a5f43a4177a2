import type { GradebookAssignment, GradebookStudent } from "@/lib/gradebook/types";
import { CellFlags, cellText } from "./cell-badges";

/** The phone's gradebook: one card a student, each assignment a line that opens the work. */
export function StudentCards({ classId, assignments, students, onOpen }: { classId: number; assignments: GradebookAssignment[]; students: GradebookStudent[]; onOpen: (assignmentId: number, studentId: number) => void }) {
  return (
    <ul className="space-y-3" aria-label="Students">
      {students.map((s) => (
        <li key={s.id} className="card space-y-2 p-3" data-student-card={s.name}>
          <div className="flex items-baseline justify-between gap-2">
            <h3 className="text-lg break-words">{s.name}</h3>
            <p className="measure font-semibold whitespace-nowrap">{s.percent}%</p>
          </div>
          <p className="measure text-sm text-ink-soft">
            {s.earned} / {s.possible} points
          </p>
          <ul className="divide-y divide-rule border-y border-rule">
            {s.cells.map((cell, i) => (
              <li key={cell.assignmentId}>
                <button type="button" className="gb-line" onClick={() => onOpen(assignments[i].id, s.id)}>
                  <span className="min-w-0 break-words">{assignments[i].title}</span>
                  <span className="flex shrink-0 items-center gap-1">
                    <CellFlags cell={cell} />
                    <span className="measure">{cell.excused ? "excused" : `${cellText(cell)} / ${cell.possible}`}</span>
                  </span>
                </button>
              </li>
            ))}
          </ul>
          <a href={`/api/classes/${classId}/students/${s.id}/record.csv`} download className="text-sm" data-chrome>
            Download {s.name}&apos;s record (CSV)
          </a>
        </li>
      ))}
    </ul>
  );
}
