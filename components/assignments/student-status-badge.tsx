import type { ReactNode } from "react";
import { WORK_STATUS_TEXT, type WorkStatus } from "@/lib/assignments/student-status";

/**
 * A small clock drawn inline: the stopwatch character is missing from our fonts and showed as an
 * empty box. It takes the text colour and size, and is decoration beside the word "late".
 */
export function ClockMark() {
  return (
    <svg viewBox="0 0 16 16" width="0.9em" height="0.9em" aria-hidden="true" focusable="false" className="inline-block shrink-0 align-[-0.1em]" data-clock-mark>
      <circle cx="8" cy="8" r="6.5" fill="none" stroke="currentColor" strokeWidth="1.75" />
      <path d="M8 4.25V8l2.5 1.75" fill="none" stroke="currentColor" strokeWidth="1.75" strokeLinecap="round" strokeLinejoin="round" />
    </svg>
  );
}

// Each status has its own mark as well as its colour, so it reads the same in greyscale and print.
const LOOK: Record<WorkStatus, { mark: ReactNode; className: string }> = {
  "not-started": { mark: "○", className: "border-rule-strong bg-paper-raised text-ink-soft" },
  "in-progress": { mark: "◐", className: "border-chalk bg-chalk-light text-chalk-dark" },
  submitted: { mark: "✓", className: "border-ok bg-ok-bg text-ok" },
  late: { mark: <ClockMark />, className: "border-caution-edge bg-caution-bg text-caution" },
  missing: { mark: "✕", className: "border-danger bg-danger-bg text-danger" },
};

export function StudentStatusBadge({ status }: { status: WorkStatus }) {
  const look = LOOK[status];
  return (
    <span className={`inline-flex items-center gap-1 rounded-sm border px-2 py-0.5 text-xs font-semibold whitespace-nowrap ${look.className}`} data-status={status}>
      <span aria-hidden="true">{look.mark}</span>
      {WORK_STATUS_TEXT[status]}
    </span>
  );
}

/** A small flag beside a score: the work (or some of it) came in after the due date. */
export function LateFlag() {
  return (
    <span className="inline-flex items-center gap-1 rounded-sm border border-caution-edge bg-caution-bg px-1.5 text-xs font-semibold text-caution" data-late>
      <ClockMark />
      late
    </span>
  );
}
