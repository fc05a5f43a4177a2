"use client";

import { useEffect, useRef } from "react";
import useSWR from "swr";
import { SubmissionProblem } from "@/components/assignments/submissions-problem";
import { StudentStatusBadge } from "@/components/assignments/student-status-badge";
import { Alert } from "@/components/ui/alert";
import { callApi } from "@/components/ui/call-api";
import { LocalTime } from "@/components/ui/local-time";
import { PhotoReview } from "@/components/uploads/photo-review";
import type { DrillDownView } from "@/lib/gradebook/types";
import type { GradebookCell } from "@/lib/gradebook/types";
import { CellFlags } from "./cell-badges";
import { OverrideForm } from "./override-form";

async function fetchDrillDown(url: string): Promise<DrillDownView> {
  const result = await callApi<DrillDownView>(url, "GET");
  if (!result.ok) throw new Error(result.message);
  return result.data;
}

const ACTION_TEXT = { points: "Set the points", excused: "Excused", cleared: "Back to the computed score" } as const;
const pointsText = (p: number | null) => (p === null ? "excused" : String(p));

type Props = { classId: number; assignmentId: number; studentId: number; cell: GradebookCell | null; onClose: () => void; onChanged: () => void };

/** One student's work on one assignment, beside the gradebook, with the override form and history. */
export function DrillDownPanel({ classId, assignmentId, studentId, cell, onClose, onChanged }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  const path = `/api/classes/${classId}/gradebook/${assignmentId}/${studentId}`;
  const { data, error, isLoading, mutate } = useSWR(path, fetchDrillDown);
  useEffect(() => {
    const dialog = ref.current;
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    if (dialog && !dialog.open) dialog.showModal();
    // The panel is unmounted while open, and then the browser does not hand focus back: give it
    // back to the cell that opened it, so a keyboard user carries on where they were.
    return () => {
      if (opener?.isConnected) opener.focus();
    };
  }, []);
  const review = data?.review;

  return (
    <dialog
      ref={ref}
      aria-labelledby="drill-heading"
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      className="m-0 ml-auto h-dvh max-h-none w-full max-w-3xl overflow-y-auto bg-paper p-0 text-ink shadow-xl backdrop:bg-ink/40 sm:w-[90vw]"
      data-drill-down
    >
      <div className="sticky top-0 z-10 flex items-start justify-between gap-3 border-b border-rule bg-paper-raised p-4">
        <div className="min-w-0">
          <h2 id="drill-heading" className="text-xl break-words">
            {review ? `${review.student.name} — ${review.assignment.title}` : "Loading the work…"}
          </h2>
          {cell ? (
            <p className="mt-1 flex flex-wrap items-center gap-2 text-sm">
              {cell.status === "excused" ? <span className="font-semibold">Excused</span> : <StudentStatusBadge status={cell.status} />}
              <CellFlags cell={cell} />
              <span className="measure font-semibold" data-cell-score>
                {cell.excused ? "excused" : `${cell.earned} / ${cell.possible}`}
              </span>
              {cell.overridden || cell.excused ? <span className="text-ink-soft">(from the tries: {cell.computedEarned})</span> : null}
            </p>
          ) : null}
        </div>
        <button type="button" className="btn-quiet shrink-0" onClick={onClose}>
          Close
        </button>
      </div>
      <div className="space-y-6 p-4">
        {error ? <Alert tone="error">{error.message}</Alert> : null}
        {isLoading && !data ? <p className="text-ink-soft">Loading the tries, photos and history…</p> : null}
        {data && review ? (
          <>
            <p className="flex flex-wrap gap-3 text-sm" data-chrome>
              <a href={`/api/classes/${classId}/students/${studentId}/record.csv`} download>
                Download {review.student.name}&apos;s record (CSV)
              </a>
              <a href={`/classes/${classId}/assignments/${assignmentId}/students/${studentId}`}>Open on its own page</a>
            </p>
            <OverrideForm
              path={path}
              studentName={review.student.name}
              possible={review.score.possible}
              hasOverride={data.inForce !== null}
              onSaved={() => {
                void mutate();
                onChanged();
              }}
            />
            <section aria-labelledby="history-heading" className="space-y-2">
              <h3 id="history-heading" className="text-lg">
                Changes to this score
              </h3>
              {data.history.length === 0 ? (
                <p className="text-ink-soft">None: the score is what the tries give.</p>
              ) : (
                <ol className="space-y-2" data-history>
                  {data.history.map((h) => (
                    <li key={h.id} className="card p-3 text-sm">
                      <p className="font-semibold">
                        {ACTION_TEXT[h.action]}: <span className="measure">{pointsText(h.fromPoints)}</span> → <span className="measure">{pointsText(h.toPoints)}</span>
                      </p>
                      <p>“{h.reason}”</p>
                      <p className="text-ink-soft">
                        {h.byName}, <LocalTime iso={h.at} />
                      </p>
                    </li>
                  ))}
                </ol>
              )}
            </section>
            <PhotoReview assignmentId={assignmentId} studentId={studentId} initial={data.photos} />
            <section aria-labelledby="tries-heading" className="space-y-3">
              <h3 id="tries-heading" className="text-lg">
                Problems and tries
              </h3>
              {review.problems.length === 0 ? (
                <p className="card p-4 text-ink-soft">{review.student.name} has not opened this assignment yet.</p>
              ) : (
                <ol className="space-y-4">
                  {review.problems.map((p) => (
                    <li key={p.id} className="space-y-1">
                      <SubmissionProblem problem={p} />
                      {p.tries.length > 0 ? (
                        <p className="text-sm text-ink-soft" data-try-times>
                          Time per try:{" "}
                          {p.tries.map((t) => {
                            const seconds = data.secondsPerTry[`${p.id}:${t.number}`];
                            return `try ${t.number} ${seconds === undefined ? "not timed" : `${seconds} s`}${t.late ? " (late)" : ""}`;
                          }).join(" · ")}
                        </p>
                      ) : null}
                    </li>
                  ))}
                </ol>
              )}
            </section>
          </>
        ) : null}
      </div>
    </dialog>
  );
}
