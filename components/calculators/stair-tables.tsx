"use client";

import { useState } from "react";
import type { RuleOfThumb, StairStep } from "@/lib/layout/stairs";
import { cell, DataTable, FIRST_ROWS, rowLine, ShowAllRows } from "./data-table";
import { lengthText, type Display } from "./readouts";

// The stair sheet prints tighter than the screen so a long stair fits one page.
const printCell = `${cell} print:py-0.5`;

const RULE_NAMES: Record<RuleOfThumb["key"], string> = { "2R+T": "2R + T", "R+T": "R + T", RxT: "R × T" };

/** The handbook checks of a comfortable stair, each marked ok or outside its band. */
export function RulesOfThumbTable({ rules }: { rules: RuleOfThumb[] }) {
  return (
    <DataTable
      caption="Rules of thumb (R = riser, T = tread, in inches)"
      columns={["Rule", "This stair", "Aim for", "Check"]}
      compactPrint
      note={
        <p className="px-3 pb-2 text-xs text-ink-soft print:hidden">
          From the carpentry handbooks: two risers plus a tread about 25, a riser plus a tread 17 to 19, riser times tread about 75. The bands
          around 25 and 75 are this calculator&rsquo;s reading of &ldquo;about&rdquo;. Comfort, not code.
        </p>
      }
    >
      {rules.map((rule) => (
        <tr key={rule.key} className={rowLine} data-rule={rule.key} data-ok={rule.ok}>
          <th scope="row" className={`measure whitespace-nowrap ${printCell}`}>
            {RULE_NAMES[rule.key]}
          </th>
          <td className={`measure ${printCell}`}>{rule.value.toFixed(2)}</td>
          <td className={`measure whitespace-nowrap ${printCell}`}>
            {rule.low}–{rule.high}
          </td>
          <td className={`${printCell} font-semibold ${rule.ok ? "text-ok" : "text-danger"}`}>
            <span aria-hidden="true">{rule.ok ? "✓ " : "✗ "}</span>
            {rule.ok ? "ok" : "outside"}
          </td>
        </tr>
      ))}
    </DataTable>
  );
}

/** Each riser's top marked from the floor and its face along the run, as laid out on a story pole or the stringer. */
export function StepMarksTable({ steps, display }: { steps: StairStep[]; display: Display }) {
  const [all, setAll] = useState(false);
  const last = steps.length;
  return (
    <div className="space-y-2">
      <DataTable caption="Marks for each step" columns={["Riser", "Top, up from the floor", "Face, from riser 1"]} compactPrint bodyClassName="measure whitespace-nowrap">
        {steps.map((step) => (
          // Rows past the first few are folded away on screen until asked for, but always printed.
          <tr key={step.index} className={`${rowLine} ${!all && step.index > FIRST_ROWS ? "hidden print:table-row" : ""}`}>
            <th scope="row" className={printCell}>
              {step.index}
              {step.index === last ? <span className="font-sans font-normal text-ink-soft"> (upper floor)</span> : null}
            </th>
            <td className={printCell}>{lengthText(step.height.exact, display)}</td>
            <td className={printCell}>{lengthText(step.run.exact, display)}</td>
          </tr>
        ))}
      </DataTable>
      <ShowAllRows count={steps.length} all={all} onToggle={() => setAll(!all)} />
    </div>
  );
}

export function StairRoundingNote({ display }: { display: Display }) {
  return (
    <p className="text-xs text-ink-soft">
      {display.unit === "in" ? `Rounded to the nearest 1/${display.denominator}″` : "Rounded to the nearest millimetre"}; an exact half rounds up.
      Heights are measured up from the lower floor and run from the face of the first riser, each from its exact position — never by
      adding rounded risers or treads.
    </p>
  );
}
