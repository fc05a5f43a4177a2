"use client";

import { CalculatorFrame } from "./calculator-frame";
import { convertLengths } from "./convert-units";
import { CalculateSection } from "./fraction-bench-calculate";
import { ConvertSection } from "./fraction-bench-convert";
import { BenchSection } from "./fraction-bench-field";
import { LumberSection } from "./fraction-bench-lumber";
import { benchDisplay, FRACTION_BENCH_DEFAULTS, type FractionBenchValues } from "./fraction-bench-results";
import { RoundSection } from "./fraction-bench-round";
import { BenchSheet } from "./fraction-bench-sheet";
import { TapeReading } from "./tape-reading";
import { UnitPrecisionFields } from "./unit-precision-fields";
import { flatCodec, useUrlForm, type SearchParamsRecord } from "./use-url-form";

export { FRACTION_BENCH_DEFAULTS, type FractionBenchValues };

// Fields holding one length whose bare numbers follow the unit setting; the calculation is
// left as typed (its bare numbers may be counts), and the other fields are always inches.
const LENGTH_FIELDS = ["metric", "boardLength"] as const;

type Props = { initial?: SearchParamsRecord; start?: Partial<FractionBenchValues>; compact?: boolean; signedIn?: boolean };

export function FractionBench({ initial, start, compact = false, signedIn = false }: Props) {
  const defaults = { ...FRACTION_BENCH_DEFAULTS, ...start };
  const { form, choice, values, query } = useUrlForm({ defaults, initial, codec: flatCodec<FractionBenchValues>(), syncUrl: !compact });
  const { register, setValue, getValues } = form;
  const display = benchDisplay(values);

  const unitField = (unit: "in" | "mm") => choice("unit", unit, {
    onChange: (event) => {
      const to = event.target.value as "in" | "mm";
      const from = to === "mm" ? "in" : "mm";
      for (const [key, value] of Object.entries(convertLengths(getValues(), [...LENGTH_FIELDS], from, to))) setValue(key as keyof FractionBenchValues, value as string);
    },
  });

  const inputs = (
    <div className="space-y-3 lg:sticky lg:top-4">
      <p className="text-sm text-ink-soft">These settings apply to every part of the bench.</p>
      <UnitPrecisionFields unit={unitField} denominator={register("denominator")} unitValue={values.unit} />
      {values.unit === "in" ? (
        <fieldset className="space-y-1">
          <legend className="text-sm font-semibold">Write lengths as</legend>
          <label className="flex min-h-touch items-center gap-2">
            <input type="radio" {...choice("style", "inches")} /> inches, <span className="measure">22 3/4&quot;</span>
          </label>
          <label className="flex min-h-touch items-center gap-2">
            <input type="radio" {...choice("style", "feet-inches")} /> feet and inches, <span className="measure">1&apos; 10 3/4&quot;</span>
          </label>
        </fieldset>
      ) : null}
      <p className="text-xs text-ink-soft">
        Type lengths as you read them off the tape: <span className="measure">22 3/4</span>, <span className="measure">22-3/4&quot;</span>,{" "}
        <span className="measure">1&apos; 10 3/4&quot;</span>, <span className="measure">22.75</span>, <span className="measure">600 mm</span>.
      </p>
    </div>
  );

  const results = (
    <>
      <BenchSheet values={values} display={display} />
      <CalculateSection form={form} values={values} display={display} />
      <ConvertSection form={form} values={values} display={display} />
      <RoundSection form={form} values={values} />
      <BenchSection title="Read a tape" printed intro={<p className="print:hidden">Put the marker on a graduation and read it the way you would say it: reduced, 12/16 as 3/4.</p>}>
        <TapeReading
          start={values.tape}
          seed={values.seed}
          onChange={({ reading, seed }) => {
            setValue("tape", reading);
            setValue("seed", seed);
          }}
        />
      </BenchSection>
      <LumberSection form={form} values={values} display={display} />
    </>
  );

  return (
    <CalculatorFrame
      kind="fraction-bench"
      title="Fraction bench"
      inputs={inputs}
      results={results}
      query={query}
      compact={compact}
      signedIn={signedIn}
      sheetSummary={[
        ["units", display.unit === "in" ? "inches" : "millimetres"],
        ["round to", display.unit === "in" ? `1/${display.denominator}"` : "1 mm"],
      ]}
    />
  );
}
