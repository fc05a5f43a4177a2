import type { TryView } from "@/lib/assignments/work";
import { ClockMark } from "@/components/assignments/student-status-badge";
import { LocalTime } from "@/components/ui/local-time";

const VERDICT = { correct: "right", imprecise: "close", incorrect: "not right" } as const;
const VERDICT_STYLE = { correct: "text-ok", imprecise: "text-caution", incorrect: "text-danger" } as const;

/** Every try at a problem, oldest first: what was typed in each box and how it was graded. */
export function PreviousTries({ tries, showSlips = false }: { tries: TryView[]; showSlips?: boolean }) {
  if (tries.length === 0) return null;
  return (
    <ol className="space-y-2" aria-label="Tries so far">
      {tries.map((t) => (
        <li key={t.number} className="rounded border border-rule bg-paper p-2 text-sm" data-try={t.number}>
          <p className="flex flex-wrap items-center gap-x-2 font-semibold">
            Try {t.number}
            <span className="font-normal text-ink-soft">
              <LocalTime iso={t.at} />
            </span>
            {t.late ? (
              <span className="inline-flex items-center gap-1 rounded-sm border border-caution-edge bg-caution-bg px-1.5 text-xs text-caution">
                <ClockMark />
                late
              </span>
            ) : null}
          </p>
          <ul className="mt-1 grid gap-x-4 gap-y-0.5 sm:grid-cols-2">
            {t.answers.map((a) => (
              <li key={a.part} className="min-w-0">
                <span className="text-ink-soft">{a.label}:</span> <span className="measure break-all">{a.raw}</span>{" "}
                <span className={`font-semibold ${VERDICT_STYLE[a.verdict]}`}>
                  <span aria-hidden="true">{a.verdict === "correct" ? "✓" : a.verdict === "imprecise" ? "≈" : "✕"} </span>
                  {VERDICT[a.verdict]}
                </span>
                {showSlips && a.slip ? <span className="text-ink-soft"> · {a.slip}</span> : null}
              </li>
            ))}
          </ul>
        </li>
      ))}
    </ol>
  );
}
