"use client";

import { useId } from "react";
import type { UseFormReturn } from "react-hook-form";
import type { Fraction } from "@/lib/layout/core";
import { formatMeasure } from "@/lib/layout/measure";
import { BenchField, BenchForm, BenchSection } from "./fraction-bench-field";
import { decimalText, roundingLadder, signedInches, type FractionBenchValues } from "./fraction-bench-results";
import { RoundingDrawing } from "./fraction-bench-round-drawing";
import { ScrollRegion } from "@/components/ui/scroll-region";

type Props = { form: UseFormReturn<FractionBenchValues>; values: FractionBenchValues };

export function RoundSection({ form, values }: Props) {
  const id = useId();
  const ladder = roundingLadder(values.round);
  const at = (value: Fraction, d: number) => formatMeasure(value, { denominator: d }).text;

  return (
    <BenchSection
      title="Round"
      intro={
        <p>
          Where a length falls between the graduations of a 1/8″, 1/16″ and 1/32″ rule, and the one it rounds to. <strong>An exact half rounds away
          from zero (up, for a length).</strong> Some rules for reading instruments take the even graduation at an exact half instead; the bench does
          not.
        </p>
      }
    >
      <BenchForm label="Round inputs">
        <BenchField
          label="Length to round (or a calculation)"
          registration={form.register("round")}
          value={values.round}
          problem={ladder.ok ? null : ladder.problem}
          note={ladder.ok ? <>exact <span className="measure">{ladder.value.toFraction(true)}″ = {decimalText(ladder.value)}″</span> (inches)</> : null}
        />
      </BenchForm>
      {ladder.ok ? (
        <>
          <RoundingDrawing value={ladder.value} rows={ladder.rows} titleId={`${id}-title`} descId={`${id}-desc`} />
          <ScrollRegion labelledBy={`${id}-ladder`}>
            <table className="w-full text-left text-sm">
              <caption id={`${id}-ladder`} className="px-3 pt-2 text-left text-sm font-semibold">Rounding to each graduation</caption>
              <thead className="border-b border-rule bg-paper-sunk">
                <tr>
                  <th scope="col" className="px-3 py-2">Round to</th>
                  <th scope="col" className="px-3 py-2">Lands on</th>
                  <th scope="col" className="px-3 py-2">Error</th>
                  <th scope="col" className="px-3 py-2">Between the graduations</th>
                </tr>
              </thead>
              <tbody className="measure">
                {ladder.rows.map((row) => (
                  <tr key={row.denominator} className="border-b border-rule last:border-0" data-round-to={row.denominator}>
                    <th scope="row" className="px-3 py-1.5">1/{row.denominator}″</th>
                    <td className="whitespace-nowrap px-3 py-1.5 font-bold">
                      {at(row.rounded, row.denominator)}
                      {row.tie ? <span className="block whitespace-normal font-sans text-xs font-normal text-ink-soft">exactly halfway: away from zero</span> : null}
                      {row.below.equals(row.above) ? <span className="block whitespace-normal font-sans text-xs font-normal text-ink-soft">on a graduation</span> : null}
                    </td>
                    <td className="px-3 py-1.5">{signedInches(row.error)}</td>
                    <td className="px-3 py-1.5 whitespace-nowrap">
                      {row.below.equals(row.above) ? at(row.below, row.denominator) : `${at(row.below, row.denominator)} – ${at(row.above, row.denominator)}`}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </ScrollRegion>
        </>
      ) : (
        <p className="rounded border border-rule bg-paper-sunk p-3 text-sm text-ink-soft">Fix the length to see where it rounds.</p>
      )}
    </BenchSection>
  );
}
