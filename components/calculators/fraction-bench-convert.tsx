"use client";

import type { ReactNode } from "react";
import type { UseFormReturn } from "react-hook-form";
import type { Fraction } from "@/lib/layout/core";
import { formatMeasure } from "@/lib/layout/measure";
import { BenchField, BenchForm, BenchSection } from "./fraction-bench-field";
import {
  decimalText,
  decimalToFraction,
  errorWord,
  millimetresText,
  readLength,
  signedInches,
  type BenchDisplay,
  type FractionBenchValues,
} from "./fraction-bench-results";

const PARTS: Record<number, string> = { 2: "halves", 4: "quarters", 8: "eighths", 16: "sixteenths", 32: "thirty-seconds", 64: "sixty-fourths" };

type Props = { form: UseFormReturn<FractionBenchValues>; values: FractionBenchValues; display: BenchDisplay };

function Card({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="min-w-0 space-y-2 rounded border border-rule p-3">
      <h3 className="text-base">{title}</h3>
      {children}
    </div>
  );
}

function Answer({ label, children, note }: { label: string; children: ReactNode; note?: ReactNode }) {
  return (
    <dl>
      <dt className="text-xs font-semibold uppercase tracking-wide text-ink-faint">{label}</dt>
      <dd className="measure text-xl font-bold">{children}</dd>
      {note ? <dd className="measure text-xs text-ink-soft">{note}</dd> : null}
    </dl>
  );
}

export function ConvertSection({ form, values, display }: Props) {
  const d = display.denominator;
  const fromDecimal = decimalToFraction(values.decimal, d);
  const fraction = readLength(values.fraction, "in");
  const metric = readLength(values.metric, display.unit);
  const inchesText = (value: Fraction, denominator = d) => formatMeasure(value, { denominator }).text;

  return (
    <BenchSection title="Convert" intro={<p>A calculator&apos;s decimal to the nearest tape fraction, a fraction back to a decimal, and inches to millimetres.</p>}>
      <div className="grid gap-3 @2xl:grid-cols-3">
        <Card title="Decimal to a fraction">
          <BenchForm label="Decimal to a fraction inputs">
            <BenchField
              label="Decimal inches"
              inputMode="decimal"
              registration={form.register("decimal")}
              value={values.decimal}
              problem={fromDecimal.ok ? null : fromDecimal.problem}
              note={`to the nearest 1/${d}″ (Round to, in the settings)`}
            />
          </BenchForm>
          {fromDecimal.ok ? (
            <>
              <Answer label={`Nearest 1/${d}″`} note={`error ${signedInches(fromDecimal.error)} · ${errorWord(fromDecimal.error)}`}>
                {fromDecimal.text}
              </Answer>
              {fromDecimal.working && !fromDecimal.working.part.equals(0) ? (
                <p className="measure text-xs text-ink-soft">
                  {decimalText(fromDecimal.working.part)} × {d} = {decimalText(fromDecimal.working.scaled)} {PARTS[d]} → {fromDecimal.working.units.toString()}/{d}
                  {fromDecimal.working.tie ? " (an exact half rounds up)" : ""}; {fromDecimal.working.whole.toString()}″ + {fromDecimal.working.units.toString()}/{d}″ ={" "}
                  {fromDecimal.text}
                </p>
              ) : null}
            </>
          ) : null}
        </Card>
        <Card title="Fraction to a decimal">
          <BenchForm label="Fraction to a decimal inputs">
            <BenchField
              label="Fraction or mixed number"
              registration={form.register("fraction")}
              value={values.fraction}
              problem={fraction.ok ? null : fraction.problem}
              note={fraction.ok ? <>reads as <span className="measure">{inchesText(fraction.value, 64)}</span></> : null}
            />
          </BenchForm>
          {fraction.ok ? (
            <Answer label="Decimal inches" note={decimalText(fraction.value).endsWith("…") ? "it repeats; cut at 6 places" : "exact"}>
              {decimalText(fraction.value)}″
            </Answer>
          ) : null}
        </Card>
        <Card title="Inches and millimetres">
          <BenchForm label="Inches and millimetres inputs">
            <BenchField
              label="Length, in inches or mm"
              registration={form.register("metric")}
              value={values.metric}
              problem={metric.ok ? null : metric.problem}
              note={display.unit === "mm" ? "Numbers with no unit are millimetres." : 'Numbers with no unit are inches; write 600 mm for metric.'}
            />
          </BenchForm>
          {metric.ok ? (
            <>
              <Answer label="In millimetres" note="exact: 1″ = 25.4 mm">
                {millimetresText(metric.value)}
              </Answer>
              <Answer
                label="In inches"
                note={`${decimalText(metric.value)}″ · to 1/${d}″, error ${signedInches(formatMeasure(metric.value, { denominator: d }).error)}`}
              >
                {inchesText(metric.value)}
              </Answer>
            </>
          ) : null}
        </Card>
      </div>
    </BenchSection>
  );
}
