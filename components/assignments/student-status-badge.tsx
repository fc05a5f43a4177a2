import { WORK_STATUS_TEXT, type WorkStatus } from "@/lib/assignments/student-status";

// Each status has its own mark as well as its colour, so it reads the same in greyscale and print.
const LOOK: Record<WorkStatus, { mark: string; className: string }> = {
  "not-started": { mark: "○", className: "border-rule-strong bg-paper-raised text-ink-soft" },
  "in-progress": { mark: "◐", className: "border-chalk bg-chalk-light text-chalk-dark" },
  submitted: { mark: "✓", className: "border-ok bg-ok-bg text-ok" },
  late: { mark: "⏱", className: "border-caution-edge bg-caution-bg text-caution" },
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
      <span aria-hidden="true">⏱</span>late
    </span>
  );
}
