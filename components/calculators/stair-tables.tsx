"use client";

import { useState } from "react";
import type { RuleOfThumb, StairStep } from "@/lib/layout/stairs";
import { lengthText, type Display } from "./readouts";

const FIRST_ROWS = 40;

const RULE_NAMES: Record<RuleOfThumb["key"], string> = { "2R+T": "2R + T", "R+T": "R + T", RxT: "R × T" };

/** The handbook checks of a comfortable stair, each marked ok or outside its band. */
export function RulesOfThumbTable({ rules }: { rules: RuleOfThumb[] }) {
  return (
    <div className="card overflow-x-auto">
      <table className="w-full text-left text-sm print:text-xs">
        <caption className="px-3 pt-2 text-left text-sm font-semibold">Rules of thumb (R = riser, T = tread, in inches)</caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            <th scope="col" className="px-3 py-2 print:py-1">
              Rule
            </th>
            <th scope="col" className="px-3 py-2 print:py-1">
              This stair
            </th>
            <th scope="col" className="px-3 py-2 print:py-1">
              Aim for
            </th>
            <th scope="col" className="px-3 py-2 print:py-1">
              Check
            </th>
          </tr>
        </thead>
        <tbody>
          {rules.map((rule) => (
            <tr key={rule.key} className="border-b border-rule last:border-0" data-rule={rule.key} data-ok={rule.ok}>
              <th scope="row" className="measure whitespace-nowrap px-3 py-1.5 print:py-0.5">
                {RULE_NAMES[rule.key]}
              </th>
              <td className="measure px-3 py-1.5 print:py-0.5">{rule.value.toFixed(2)}</td>
              <td className="measure whitespace-nowrap px-3 py-1.5 print:py-0.5">
                {rule.low}–{rule.high}
              </td>
              <td className={`px-3 py-1.5 print:py-0.5 font-semibold ${rule.ok ? "text-ok" : "text-danger"}`}>
                <span aria-hidden="true">{rule.ok ? "✓ " : "✗ "}</span>
                {rule.ok ? "ok" : "outside"}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="px-3 pb-2 text-xs text-ink-soft print:hidden">
        From the carpentry handbooks: two risers plus a tread about 25, a riser plus a tread 17 to 19, riser times tread about 75. The bands
        around 25 and 75 are this calculator&rsquo;s reading of &ldquo;about&rdquo;. Comfort, not code.
      </p>
    </div>
  );
}

/** Each riser's top marked from the floor and its face along the run, as laid out on a story pole or the stringer. */
export function StepMarksTable({ steps, display }: { steps: StairStep[]; display: Display }) {
  const [all, setAll] = useState(false);
  const last = steps.length;
  return (
    <div className="space-y-2">
      <div className="card overflow-x-auto">
        <table className="w-full text-left text-sm print:text-xs">
          <caption className="px-3 pt-2 text-left text-sm font-semibold">Marks for each step</caption>
          <thead className="border-b border-rule bg-paper-sunk">
            <tr>
              <th scope="col" className="px-3 py-2 print:py-1">
                Riser
              </th>
              <th scope="col" className="px-3 py-2 print:py-1">
                Top, up from the floor
              </th>
              <th scope="col" className="px-3 py-2 print:py-1">
                Face, from riser 1
              </th>
            </tr>
          </thead>
          <tbody className="measure whitespace-nowrap">
            {steps.map((step) => (
              // Rows past the first few are folded away on screen until asked for, but always printed.
              <tr key={step.index} className={`border-b border-rule last:border-0 ${!all && step.index > FIRST_ROWS ? "hidden print:table-row" : ""}`}>
                <th scope="row" className="px-3 py-1.5 print:py-0.5">
                  {step.index}
                  {step.index === last ? <span className="font-sans font-normal text-ink-soft"> (upper floor)</span> : null}
                </th>
                <td className="px-3 py-1.5 print:py-0.5">{lengthText(step.height.exact, display)}</td>
                <td className="px-3 py-1.5 print:py-0.5">{lengthText(step.run.exact, display)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {steps.length > FIRST_ROWS ? (
        <button type="button" data-chrome className="btn-quiet" onClick={() => setAll(!all)}>
          {all ? `Show the first ${FIRST_ROWS}` : `Show all ${steps.length} rows`}
        </button>
      ) : null}
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
