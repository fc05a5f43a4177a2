"use client";

import { useMemo } from "react";
import { evenSpacing } from "@/lib/layout/spacing";
import { evenSpacingSchema } from "@/lib/layout/spacing-schema";
import { fieldErrorsFrom } from "@/lib/errors";
import { CalculatorFrame } from "./calculator-frame";
import { convertLengths } from "./convert-units";
import { MarksTable } from "./marks-table";
import { MeasureField } from "./measure-field";
import { CountReadout, FixFieldsNote, Readout, ReadoutGrid, RoundingNote, WarningList, lengthText } from "./readouts";
import { SpacingDrawing } from "./spacing-drawing";
import { UnitPrecisionFields } from "./unit-precision-fields";
import { flatCodec, useUrlForm, type SearchParamsRecord } from "./use-url-form";

export type EvenSpacingValues = {
  unit: string;
  denominator: string;
  span: string;
  memberWidth: string;
  by: string; // "count" | "maxGap"
  count: string;
  maxGap: string;
  endCondition: string; // "members" | "gaps"
};

// The demo hallway wall (invented) with 1x4 battens, 3 1/2" actual (PS 20).
export const EVEN_SPACING_DEFAULTS: EvenSpacingValues = {
  unit: "in",
  denominator: "16",
  span: "141 1/2",
  memberWidth: "3 1/2",
  by: "count",
  count: "8",
  maxGap: "16",
  endCondition: "members",
};

const LENGTH_FIELDS = ["span", "memberWidth", "maxGap"] as const;

type Props = { initial?: SearchParamsRecord; start?: Partial<EvenSpacingValues>; compact?: boolean; signedIn?: boolean };

export function EvenSpacingCalculator({ initial, start, compact = false, signedIn = false }: Props) {
  const defaults = { ...EVEN_SPACING_DEFAULTS, ...start };
  const { form, choice, values, query } = useUrlForm({ defaults, initial, codec: flatCodec<EvenSpacingValues>(), syncUrl: !compact });
  const { register, setValue, getValues } = form;

  const parsed = useMemo(
    () =>
      evenSpacingSchema.safeParse({
        ...values,
        count: values.by === "count" ? values.count : "",
        maxGap: values.by === "maxGap" ? values.maxGap : "",
      }),
    [values],
  );
  const errors = parsed.success ? {} : fieldErrorsFrom(parsed.error.issues);
  const result = parsed.success ? evenSpacing(parsed.data) : null;
  const display = { unit: parsed.success ? parsed.data.unit : "in", denominator: parsed.success ? parsed.data.denominator : 16 } as const;

  const unitField = (unit: "in" | "mm") => choice("unit", unit, {
    onChange: (event) => {
      const to = event.target.value as "in" | "mm";
      const from = to === "mm" ? "in" : "mm";
      for (const [key, value] of Object.entries(convertLengths(getValues(), [...LENGTH_FIELDS], from, to))) setValue(key as keyof EvenSpacingValues, value as string);
    },
  });

  const inputs = (
    <>
      <UnitPrecisionFields unit={unitField} denominator={register("denominator")} unitValue={values.unit} />
      <MeasureField label="Span" registration={register("span")} value={values.span} unit={display.unit} denominator={display.denominator} error={errors.span} />
      <MeasureField label="Member width" registration={register("memberWidth")} value={values.memberWidth} unit={display.unit} denominator={display.denominator} error={errors.memberWidth} hint="e.g. 3 1/2 for a 1x4" />
      <fieldset className="space-y-2">
        <legend className="text-sm font-semibold">Ends of the span</legend>
        <label className="flex min-h-touch items-center gap-2">
          <input type="radio" {...choice("endCondition", "members")} /> A member flush at each end (battens on a wall)
        </label>
        <label className="flex min-h-touch items-center gap-2">
          <input type="radio" {...choice("endCondition", "gaps")} /> A gap at each end (between two posts)
        </label>
      </fieldset>
      <fieldset className="space-y-2">
        <legend className="text-sm font-semibold">Decide the layout by</legend>
        <label className="flex min-h-touch items-center gap-2">
          <input type="radio" {...choice("by", "count")} /> How many members
        </label>
        <label className="flex min-h-touch items-center gap-2">
          <input type="radio" {...choice("by", "maxGap")} /> The widest gap allowed
        </label>
      </fieldset>
      {values.by === "count" ? (
        <div>
          <label htmlFor="es-count" className="mb-1 block text-sm font-semibold">
            Number of members
          </label>
          <input id="es-count" inputMode="numeric" className="input measure" aria-invalid={errors.count ? true : undefined} aria-describedby="es-count-error" {...register("count")} />
          <p id="es-count-error" className="mt-1 min-h-5 text-xs font-semibold text-danger">
            {errors.count}
          </p>
        </div>
      ) : (
        <MeasureField label="Widest gap allowed" registration={register("maxGap")} value={values.maxGap} unit={display.unit} denominator={display.denominator} error={errors.maxGap ?? errors.count} />
      )}
    </>
  );

  const results = result ? (
    <>
      <SpacingDrawing result={result} display={display} />
      <ReadoutGrid>
        <CountReadout label="Members" value={result.count} />
        <CountReadout label="Spaces" value={result.spaces} note={result.endCondition === "members" ? "members − 1" : "members + 1"} />
        <Readout label="Members take up" value={result.totalMemberWidth} display={display} />
        <Readout label="Free space" value={result.freeSpace} display={display} note="span − members" />
        <Readout label="Gap" value={result.gap} display={display} note={`free space ÷ ${result.spaces} spaces`} />
        <Readout label="On centre" value={result.onCenter} display={display} note="gap + member width" />
      </ReadoutGrid>
      <WarningList warnings={result.warnings} />
      {result.members.length > 0 ? <MarksTable members={result.members} display={display} /> : null}
      <RoundingNote denominator={display.denominator} unit={display.unit} />
    </>
  ) : (
    <FixFieldsNote errorCount={Object.keys(errors).length} what="layout" />
  );

  return (
    <CalculatorFrame
      kind="even-spacing"
      title="Even spacing"
      inputs={inputs}
      results={results}
      query={query}
      compact={compact}
      signedIn={signedIn}
      sheetSummary={result && [["span", lengthText(result.span, display)], ["members", `${result.count} × ${lengthText(result.memberWidth, display)}`], ["ends", result.endCondition === "members" ? "members flush" : "gaps at posts"]]}
    />
  );
}
