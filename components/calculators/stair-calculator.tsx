"use client";

import { useMemo } from "react";
import { Fraction } from "@/lib/layout/core";
import { formatMeasure } from "@/lib/layout/measure";
import { CODE_MAX_RISER, CODE_MIN_TREAD, stairLayout, type StairLayoutResult } from "@/lib/layout/stairs";
import { stairLayoutSchema } from "@/lib/layout/stairs-schema";
import { fieldErrorsFrom } from "@/lib/errors";
import { CalculatorFrame } from "./calculator-frame";
import { convertLengths } from "./convert-units";
import { MeasureField } from "./measure-field";
import { CodeCaution, CountReadout, Readout, ReadoutGrid, WarningList, lengthText, type Display } from "./readouts";
import { StairDrawing } from "./stair-drawing";
import { RulesOfThumbTable, StairRoundingNote, StepMarksTable } from "./stair-tables";
import { UnitPrecisionFields } from "./unit-precision-fields";
import { flatCodec, useUrlForm, type SearchParamsRecord } from "./use-url-form";

export type StairLayoutValues = {
  unit: string;
  denominator: string;
  totalRise: string;
  treadsBy: string; // "minimum" | "totalRun" | "treadDepth"
  totalRun: string;
  treadDepth: string;
  maxRiser: string;
  minTread: string;
  targetRiser: string;
  nosing: string;
};

// The demo stair (invented): 104 3/4" from finished floor to finished floor, a 1" nosing.
export const STAIR_LAYOUT_DEFAULTS: StairLayoutValues = {
  unit: "in",
  denominator: "16",
  totalRise: "104 3/4",
  treadsBy: "minimum",
  totalRun: "",
  treadDepth: "",
  maxRiser: "",
  minTread: "",
  targetRiser: "",
  nosing: "1",
};

const LENGTH_FIELDS = ["totalRise", "totalRun", "treadDepth", "maxRiser", "minTread", "targetRiser", "nosing"] as const;

/** A code limit in the form's unit, to a tenth of a millimetre so 7 3/4" reads 196.9 mm (and 10" reads 254 mm). */
function codeText(value: Fraction, display: Display, style: "inches" | "feet-inches" = "inches"): string {
  return formatMeasure(value, { unit: display.unit, denominator: 64, mmDecimals: 1, style: display.unit === "in" ? style : undefined }).text.replace(/\.0 mm$/, " mm");
}

type Props = { initial?: SearchParamsRecord; start?: Partial<StairLayoutValues>; compact?: boolean; signedIn?: boolean };

export function StairCalculator({ initial, start, compact = false, signedIn = false }: Props) {
  const defaults = { ...STAIR_LAYOUT_DEFAULTS, ...start };
  const { form, choice, values, query } = useUrlForm({ defaults, initial, codec: flatCodec<StairLayoutValues>(), syncUrl: !compact });
  const { register, setValue, getValues } = form;

  const treadsBy = values.treadsBy === "totalRun" || values.treadsBy === "treadDepth" ? values.treadsBy : "minimum";
  const chosenLengthMissing = treadsBy !== "minimum" && values[treadsBy].trim() === "";
  const parsed = useMemo(
    () =>
      stairLayoutSchema.safeParse({
        ...values,
        totalRun: treadsBy === "totalRun" ? values.totalRun : "",
        treadDepth: treadsBy === "treadDepth" ? values.treadDepth : "",
      }),
    [values, treadsBy],
  );
  const errors = parsed.success ? {} : fieldErrorsFrom(parsed.error.issues);
  // With "a total run" or "a tread depth" chosen, a blank box is a missing answer, not the default.
  const result = parsed.success && !chosenLengthMissing ? stairLayout(parsed.data) : null;
  const display: Display = { unit: parsed.success ? parsed.data.unit : "in", denominator: parsed.success ? parsed.data.denominator : 16 };
  const maxRiser = parsed.success ? parsed.data.maxRiser : CODE_MAX_RISER;

  const unitField = (unit: "in" | "mm") => choice("unit", unit, {
    onChange: (event) => {
      const to = event.target.value as "in" | "mm";
      const from = to === "mm" ? "in" : "mm";
      for (const [key, value] of Object.entries(convertLengths(getValues(), [...LENGTH_FIELDS], from, to))) setValue(key as keyof StairLayoutValues, value as string);
    },
  });
  const field = { unit: display.unit, denominator: display.denominator };

  const inputs = (
    <>
      <UnitPrecisionFields unit={unitField} denominator={register("denominator")} unitValue={values.unit} />
      <MeasureField label="Total rise" registration={register("totalRise")} value={values.totalRise} {...field} error={errors.totalRise} hint="finished floor to finished floor" />
      <fieldset className="space-y-2">
        <legend className="text-sm font-semibold">Tread depth from</legend>
        <label className="flex min-h-touch items-center gap-2">
          <input type="radio" {...choice("treadsBy", "minimum")} /> The shallowest tread allowed
        </label>
        <label className="flex min-h-touch items-center gap-2">
          <input type="radio" {...choice("treadsBy", "totalRun")} /> The total run I have
        </label>
        <label className="flex min-h-touch items-center gap-2">
          <input type="radio" {...choice("treadsBy", "treadDepth")} /> A tread depth I choose
        </label>
      </fieldset>
      {treadsBy === "totalRun" ? (
        <MeasureField label="Total run" registration={register("totalRun")} value={values.totalRun} {...field} error={errors.totalRun} hint="face of the first riser to the face of the last" />
      ) : null}
      {treadsBy === "treadDepth" ? (
        <MeasureField label="Tread depth" registration={register("treadDepth")} value={values.treadDepth} {...field} error={errors.treadDepth} hint="riser face to riser face, without the nosing" />
      ) : null}
      <MeasureField optionalTag label="Tallest riser allowed" registration={register("maxRiser")} value={values.maxRiser} {...field} error={errors.maxRiser} whenBlank={`blank = ${codeText(CODE_MAX_RISER, display)} (IRC R311.7.5.1)`} />
      <MeasureField optionalTag label="Shallowest tread allowed" registration={register("minTread")} value={values.minTread} {...field} error={errors.minTread} whenBlank={`blank = ${codeText(CODE_MIN_TREAD, display)} (IRC R311.7.5.2)`} />
      <MeasureField optionalTag label="Riser to aim for" registration={register("targetRiser")} value={values.targetRiser} {...field} error={errors.targetRiser} whenBlank={`blank = the fewest risers under the tallest allowed; about ${codeText(new Fraction(7), display)} is comfortable`} />
      <MeasureField optionalTag label="Nosing" registration={register("nosing")} value={values.nosing} {...field} error={errors.nosing} whenBlank="blank = no nosing" />
    </>
  );

  const caution = (
    <div className="print:[&_aside]:text-xs">
      <CodeCaution>
        The model code limits each riser to {codeText(CODE_MAX_RISER, display)} (R311.7.5.1), asks for treads at least {codeText(CODE_MIN_TREAD, display)} deep
        (R311.7.5.2), headroom of at least {codeText(new Fraction(80), display, "feet-inches")} (R311.7.2) and a width of at least {codeText(new Fraction(36), display)}{" "}
        (R311.7.1). A stair is structural: stringer stock, fastening and the landing belong to your local code and licensed practice.
      </CodeCaution>
    </div>
  );

  const results = result ? (
    <>
      <StairDrawing result={result} display={display} />
      <StairReadouts result={result} display={display} maxRiser={maxRiser} aimed={parsed.success && parsed.data.targetRiser !== undefined} />
      {result.treadCount > 0 ? (
        <p className="text-sm text-ink-soft print:hidden">
          <strong className="text-ink">Stringer length and angle are approximate.</strong> {result.stringerLength.note} {result.angleDegrees.note}
        </p>
      ) : null}
      <WarningList warnings={result.warnings} />
      {caution}
      {/* On paper the two tables sit side by side so a whole flight fits on one sheet. */}
      <div className="space-y-4 print:grid print:grid-cols-2 print:items-start print:gap-3 print:space-y-0">
        <StepMarksTable steps={result.steps} display={display} />
        <div className="space-y-4 print:space-y-2">
          {result.rulesOfThumb.length > 0 ? <RulesOfThumbTable rules={result.rulesOfThumb} /> : null}
          <p className="text-sm text-ink-soft">{result.variationNote}</p>
          <StairRoundingNote display={display} />
        </div>
      </div>
    </>
  ) : (
    <>
      <p className="card p-4 text-ink-soft">
        {chosenLengthMissing && Object.keys(errors).length === 0
          ? `Enter the ${treadsBy === "totalRun" ? "total run" : "tread depth"} to see the layout.`
          : `Fix the highlighted ${Object.keys(errors).length > 1 ? "fields" : "field"} to see the layout.`}
      </p>
      {caution}
    </>
  );

  return (
    <CalculatorFrame
      kind="stairs"
      title="Stair layout"
      inputs={inputs}
      results={results}
      query={query}
      compact={compact}
      signedIn={signedIn}
      sheetSummary={
        result && [
          ["total rise", lengthText(result.totalRise, display, "feet-inches")],
          ["risers", `${result.riserCount} × ${lengthText(result.riserHeight.exact, display)}`],
          ["treads", `${result.treadCount} × ${lengthText(result.treadDepth.exact, display)}`],
          ["total run", lengthText(result.totalRun.exact, display, "feet-inches")],
        ]
      }
    />
  );
}

// On paper the readouts go five across without their notes; the exact value and error stay.
const PRINT_READOUTS = "print:[&>dl]:grid-cols-5 print:[&_dd:first-of-type]:text-lg print:[&_dd.mt-1]:hidden";

const TREAD_SOURCE: Record<StairLayoutResult["treadDepthFrom"], string> = {
  given: "as given",
  "total-run": "total run ÷ treads",
  minimum: "the shallowest allowed",
};

function StairReadouts({ result, display, maxRiser, aimed }: { result: StairLayoutResult; display: Display; maxRiser: Fraction; aimed: boolean }) {
  const stringer = result.stringerLength;
  const approxText = display.unit === "mm" ? `${(stringer.approx * 25.4).toFixed(1)} mm` : `${stringer.approx.toFixed(3)}″`;
  // A single riser is a step up with no treads: there is no run, stringer or slope to show.
  const hasTreads = result.treadCount > 0;
  return (
    <div className={PRINT_READOUTS}>
      <ReadoutGrid>
        <CountReadout
          label="Risers"
          value={result.riserCount}
          note={aimed ? "total rise ÷ the riser to aim for, to the nearest whole, never over the limit" : `total rise ÷ ${codeText(maxRiser, display)}, rounded up`}
        />
        <Readout label="Riser height" value={result.riserHeight.exact} display={display} note={`total rise ÷ ${result.riserCount} ${result.riserCount === 1 ? "riser" : "risers"}`} />
        <Readout label="Total rise" value={result.totalRise} display={display} style="feet-inches" />
        <CountReadout label="Treads" value={result.treadCount} note="risers − 1: the upper floor is the last step" />
        {hasTreads ? (
          <>
            <Readout label="Tread depth" value={result.treadDepth.exact} display={display} note={TREAD_SOURCE[result.treadDepthFrom]} />
            <Readout label="Total run" value={result.totalRun.exact} display={display} style="feet-inches" note={`${result.treadCount} × tread depth`} />
            {result.treadBoardDepth ? <Readout label="Tread board" value={result.treadBoardDepth.exact} display={display} note="tread depth + nosing" /> : null}
            <CountReadout label="Stringer length" value={lengthText(stringer.rounded, display)} note={<>about: √(rise² + run²) ≈ <span className="measure">{approxText}</span></>} />
            <CountReadout label="Angle" value={`${result.angleDegrees.approx.toFixed(1)}°`} note="about; from the floor" />
          </>
        ) : null}
      </ReadoutGrid>
    </div>
  );
}
