import type { ReactNode } from "react";

/**
 * One chart with everything that makes it usable without seeing it: a heading, a sentence that
 * says what the chart shows, and the same numbers as a table — folded under "Show as a table" on
 * screen and printed in place of the chart on paper.
 */
export function ChartPanel({ id, heading, summary, chart, table, empty }: { id: string; heading: string; summary: string; chart: ReactNode; table: ReactNode; empty?: boolean }) {
  return (
    <section aria-labelledby={`${id}-heading`} className="card min-w-0 space-y-3 p-4" data-chart={id}>
      <h3 id={`${id}-heading`} className="text-lg">
        {heading}
      </h3>
      <p className="text-sm text-ink-soft" data-summary>
        {summary}
      </p>
      {empty ? null : (
        <>
          {/* The summary and the table carry the numbers for screen readers; the drawing is for the eye. */}
          <div aria-hidden="true" data-chrome>
            {chart}
          </div>
          <details className="text-sm" data-chrome>
            <summary className="cursor-pointer font-semibold text-chalk-dark">Show as a table</summary>
            <div className="mt-2">{table}</div>
          </details>
          <div className="hidden print:block">{table}</div>
        </>
      )}
    </section>
  );
}
