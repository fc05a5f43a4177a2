"use client";

import type { UseFormReturn } from "react-hook-form";
import type { Fraction } from "@/lib/layout/core";
import { LUMBER_SIZE_TABLE } from "@/lib/layout/lumber";
import { BenchField, BenchForm, BenchSection } from "./fraction-bench-field";
import { lumberResult, type BenchDisplay, type FractionBenchValues } from "./fraction-bench-results";
import { CountReadout, lengthText, ReadoutGrid } from "./readouts";
import { ScrollRegion } from "@/components/ui/scroll-region";

type Props = { form: UseFormReturn<FractionBenchValues>; values: FractionBenchValues; display: BenchDisplay };

export function LumberSection({ form, values, display }: Props) {
  const result = lumberResult(values.nominal, values.boardLength, display.unit);
  const size = (value: Fraction) => lengthText(value, { unit: display.unit, denominator: 16 });

  return (
    <BenchSection
      title="Lumber sizes"
      intro={<p>A 1x4 is not 1″ by 4″: dressed dry, it is 3/4″ × 3 1/2″ (American Softwood Lumber Standard PS 20). Stock is priced by the board foot, on the nominal size.</p>}
    >
      <BenchForm label="Lumber sizes inputs" className="grid gap-3 sm:grid-cols-2 sm:space-y-0">
        <BenchField
          label="Nominal size"
          registration={form.register("nominal")}
          value={values.nominal}
          problem={result.ok ? null : (result.problems.nominal ?? null)}
          note="like 1x4 or 2x6"
        />
        <BenchField
          label="Board length"
          registration={form.register("boardLength")}
          value={values.boardLength}
          problem={result.ok ? null : (result.problems.length ?? null)}
          note={result.ok ? <>reads as <span className="measure">{lengthText(result.length, { unit: display.unit, denominator: 64 }, "feet-inches")}</span></> : "like 8' or 14'"}
        />
      </BenchForm>
      {result.ok ? (
        <ReadoutGrid>
          <CountReadout label="Actual size (dry)" value={`${size(result.lumber.actual.thickness)} × ${size(result.lumber.actual.width)}`} note="PS 20 dressed dry size" />
          <CountReadout
            label="Board feet"
            value={`${result.boardFeet.toFraction(true)} bf`}
            note={`${result.lumber.nominal.t} × ${result.lumber.nominal.w} × ${result.length.div(12).toFraction(true)} ft ÷ 12 (nominal; under 1″ thick counts as 1″)`}
          />
        </ReadoutGrid>
      ) : null}
      <details className="text-sm" data-chrome>
        <summary className="cursor-pointer font-semibold">Nominal and dressed sizes (PS 20)</summary>
        <div className="mt-2 grid gap-3 sm:grid-cols-2">
          {(["thickness", "width"] as const).map((dimension) => (
            <ScrollRegion key={dimension} labelledBy={`lumber-${dimension}-caption`}>
              <table className="w-full text-left text-sm">
                <caption id={`lumber-${dimension}-caption`} className="px-3 pt-2 text-left font-semibold">Nominal {dimension}</caption>
                <thead className="border-b border-rule bg-paper-sunk">
                  <tr>
                    <th scope="col" className="px-3 py-1.5">Nominal</th>
                    <th scope="col" className="px-3 py-1.5">Dry</th>
                    <th scope="col" className="px-3 py-1.5">Green</th>
                  </tr>
                </thead>
                <tbody className="measure">
                  {LUMBER_SIZE_TABLE[dimension].map((row) => (
                    <tr key={row.nominal} className="border-b border-rule last:border-0">
                      <th scope="row" className="px-3 py-1">{row.nominal}</th>
                      <td className="px-3 py-1">{size(row.dry)}</td>
                      <td className="px-3 py-1">{size(row.green)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </ScrollRegion>
          ))}
        </div>
        <p className="mt-2 text-xs text-ink-soft">Green (unseasoned) boards are dressed fuller because they shrink to about the dry size as they dry.</p>
      </details>
    </BenchSection>
  );
}
