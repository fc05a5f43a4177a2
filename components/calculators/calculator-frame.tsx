"use client";

import { useMemo, type ReactNode } from "react";
import { CopyLinkButton, PrintButton } from "./toolbar-buttons";
import { SaveLayoutButton } from "./save-layout-button";
import type { CalculatorKind } from "@/lib/calculators";

type Props = {
  kind: CalculatorKind;
  title: string;
  /** The inputs (a form). */
  inputs: ReactNode;
  /** Results, drawing and tables; shown on screen and on the printed shop sheet. */
  results: ReactNode;
  /** The current query string, for copy-link and save. */
  query: string;
  compact?: boolean;
  signedIn?: boolean;
  /** The inputs as label/value pairs, printed as one line at the top of the shop sheet; null while the inputs cannot be read. */
  sheetSummary: [string, string][] | null;
};

function summaryLine(parts: [string, string][] | null): string {
  return parts ? parts.map(([k, v]) => `${k} ${v}`).join(" · ") : "";
}

/**
 * The common frame of every calculator: inputs beside results on a desktop, stacked on a
 * phone; a toolbar (copy link, print shop sheet, save) on the standalone page. Printing
 * hides the inputs and prints the results as a one-page shop sheet.
 */
export function CalculatorFrame({ kind, title, inputs, results, query, compact = false, signedIn = false, sheetSummary }: Props) {
  // A calculator keeps its whole state in its query, so its inputs and results are the same while
  // the query is: handing React the same elements lets it skip them when only the frame changes
  // (react-hook-form renders once more as it mounts, a render that would redraw every table).
  /* eslint-disable react-hooks/exhaustive-deps */
  const sameInputs = useMemo(() => inputs, [query]);
  const sameResults = useMemo(() => results, [query]);
  /* eslint-enable react-hooks/exhaustive-deps */
  return (
    <section aria-label={`${title} calculator`} className={compact ? "card @container my-6 space-y-4 p-4" : "space-y-4"} data-calculator={kind}>
      <div className="hidden print:block">
        <p className="text-xs uppercase tracking-wide">Sixteenths shop sheet · {title}</p>
        <p className="measure text-sm">{summaryLine(sheetSummary)}</p>
      </div>
      {compact ? null : (
        <div data-chrome className="flex flex-wrap gap-2">
          <CopyLinkButton query={query} />
          <PrintButton />
          <SaveLayoutButton kind={kind} query={query} signedIn={signedIn} />
        </div>
      )}
      {/* A compact calculator sits in a lesson's text column, narrower than any screen it is shown on:
          it goes side by side only when its own box has room for the results' tables and readouts. */}
      <div className={compact ? "grid gap-4 @3xl:grid-cols-[minmax(0,18rem)_1fr] print:block" : "grid gap-6 lg:grid-cols-[minmax(0,22rem)_1fr] print:block"}>
        <form data-chrome noValidate onSubmit={(e) => e.preventDefault()} aria-label={`${title} inputs`} className={compact ? "max-w-md @3xl:max-w-none" : undefined}>
          {/* Not disabled while the page hydrates: useUrlForm puts back what was typed meanwhile. */}
          <fieldset className="min-w-0 space-y-3">
            {sameInputs}
          </fieldset>
        </form>
        <div className="min-w-0 space-y-4" aria-live="polite">
          {sameResults}
        </div>
      </div>
      {compact ? (
        <p data-chrome className="text-sm">
          <a href={`/calculators/${kind}?${query}`}>Open this in the full {title.toLowerCase()} calculator</a>
        </p>
      ) : null}
    </section>
  );
}
