import type { GradebookCell } from "@/lib/gradebook/types";

// Each flag is a shape with a letter-like mark and a word for screen readers, so it reads the
// same in greyscale, on paper and to someone who cannot tell the colours apart.
export const FLAGS = [
  { key: "late", mark: "◔", word: "late", text: "Late: some work came in after the due date", className: "border-caution-edge bg-caution-bg text-caution" },
  { key: "missing", mark: "∅", word: "missing", text: "Missing: nothing in by the due date", className: "border-danger bg-danger-bg text-danger" },
  { key: "excused", mark: "≡", word: "excused", text: "Excused: left out of the total", className: "border-rule-strong bg-paper-sunk text-ink-soft" },
  { key: "overridden", mark: "✎", word: "changed", text: "Changed by hand: the score was set by an instructor", className: "border-chalk bg-chalk-light text-chalk-dark" },
  { key: "photos", mark: "▣", word: "photos", text: "Shop photos attached", className: "border-rule-strong bg-paper-raised text-ink" },
] as const;

export type FlagKey = (typeof FLAGS)[number]["key"];

export function flagsOf(cell: GradebookCell): FlagKey[] {
  return FLAGS.filter((f) => (f.key === "photos" ? cell.photos > 0 : cell[f.key])).map((f) => f.key);
}

export function FlagMark({ flag }: { flag: FlagKey }) {
  const f = FLAGS.find((x) => x.key === flag)!;
  return (
    <span className={`flag-mark ${f.className}`} title={f.text} data-flag={flag}>
      <span aria-hidden="true">{f.mark}</span>
      <span className="sr-only">{f.word}</span>
    </span>
  );
}

export function CellFlags({ cell }: { cell: GradebookCell }) {
  const flags = flagsOf(cell);
  if (flags.length === 0) return null;
  return (
    <span className="inline-flex gap-0.5">
      {flags.map((f) => (
        <FlagMark key={f} flag={f} />
      ))}
    </span>
  );
}

export function FlagLegend() {
  return (
    <dl className="flex flex-wrap gap-x-4 gap-y-1 text-sm" aria-label="What the marks in the gradebook mean">
      {FLAGS.map((f) => (
        <div key={f.key} className="flex items-center gap-1.5">
          <dt>
            <FlagMark flag={f.key} />
          </dt>
          <dd className="text-ink-soft">{f.text}</dd>
        </div>
      ))}
    </dl>
  );
}

/** The text a cell shows: points, or the word for work that has none. */
export function cellText(cell: GradebookCell): string {
  if (cell.excused) return "EX";
  if (cell.missing) return "—";
  return String(cell.earned);
}
