"use client";

import { useMemo } from "react";
import { Fraction } from "@/lib/layout/core";
import { GUARD_MAX_OPENING, guardSpacing, type GuardSpacingResult } from "@/lib/layout/guards";
import { guardSpacingSchema } from "@/lib/layout/guards-schema";
import { formatMeasure } from "@/lib/layout/measure";
import { fieldErrorsFrom } from "@/lib/errors";
import { CalculatorFrame } from "./calculator-frame";
import { convertLengths } from "./convert-units";
import { GuardDrawing } from "./guard-drawing";
import { MarksTable } from "./marks-table";
import { MeasureField } from "./measure-field";
import { CodeCaution, CountReadout, FixFieldsNote, exactAndError, Readout, ReadoutGrid, RoundingNote, WarningList, lengthText, type Display } from "./readouts";
import { UnitPrecisionFields } from "./unit-precision-fields";
import { flatCodec, useUrlForm, type SearchParamsRecord } from "./use-url-form";

export type GuardSpacingValues = {
  unit: string;
  denominator: string;
  span: string;
  balusterWidth: string;
  limit: string; // "level" | "stair" | "other"
  maxOpening: string; // used only with limit "other"
};

// The demo porch guard (invented), 9' 2" between posts, with 2x2 balusters: 1 1/2" actual (PS 20).
export const GUARD_SPACING_DEFAULTS: GuardSpacingValues = {
  unit: "in",
  denominator: "16",
  span: `9' 2"`,
  balusterWidth: "1 1/2",
  limit: "level",
  maxOpening: "4",
};

/** IRC 2018 R312.1.3 exception: on the open side of a stair the sphere is 4 3/8". */
const STAIR_SIDE_OPENING = new Fraction(35, 8);
// Written with its inch mark so it reads the same whichever unit the form is in.
const STAIR_SIDE_TEXT = `4 3/8"`;

const LENGTH_FIELDS = ["span", "balusterWidth", "maxOpening"] as const;

/** A code limit in the form's unit; a tenth of a millimetre so 4" reads 101.6 mm, not 102 mm. */
function limitText(value: Fraction, display: Display): string {
  return formatMeasure(value, { unit: display.unit, denominator: 64, mmDecimals: 1 }).text.replace(/\.0 mm$/, " mm");
}

type Props = { initial?: SearchParamsRecord; start?: Partial<GuardSpacingValues>; compact?: boolean; signedIn?: boolean };

export function GuardSpacingCalculator({ initial, start, compact = false, signedIn = false }: Props) {
  const defaults = { ...GUARD_SPACING_DEFAULTS, ...start };
  const { form, choice, values, query } = useUrlForm({ defaults, initial, codec: flatCodec<GuardSpacingValues>(), syncUrl: !compact });
  const { register, setValue, getValues } = form;

  const limitChoice = values.limit === "stair" || values.limit === "other" ? values.limit : "level";
  const typedLimitMissing = limitChoice === "other" && values.maxOpening.trim() === "";
  const parsed = useMemo(
    () =>
      guardSpacingSchema.safeParse({
        unit: values.unit,
        denominator: values.denominator,
        span: values.span,
        balusterWidth: values.balusterWidth,
        maxOpening: limitChoice === "stair" ? STAIR_SIDE_TEXT : limitChoice === "other" ? values.maxOpening : "",
      }),
    [values, limitChoice],
  );
  const errors = parsed.success ? {} : fieldErrorsFrom(parsed.error.issues);
  // A blank typed limit would silently fall back to 4"; with "a limit I type" chosen, ask for it instead.
  const result = parsed.success && !typedLimitMissing ? guardSpacing(parsed.data) : null;
  // When the balusters are wider than the span allows there are no openings to speak of.
  const laidOut = result !== null && result.members.length === result.count;
  const display: Display = { unit: parsed.success ? parsed.data.unit : "in", denominator: parsed.success ? parsed.data.denominator : 16 };

  const unitField = (unit: "in" | "mm") => choice("unit", unit, {
    onChange: (event) => {
      const to = event.target.value as "in" | "mm";
      const from = to === "mm" ? "in" : "mm";
      for (const [key, value] of Object.entries(convertLengths(getValues(), [...LENGTH_FIELDS], from, to))) setValue(key as keyof GuardSpacingValues, value as string);
    },
  });

  const inputs = (
    <>
      <UnitPrecisionFields unit={unitField} denominator={register("denominator")} unitValue={values.unit} />
      <MeasureField label="Span between posts" registration={register("span")} value={values.span} unit={display.unit} denominator={display.denominator} error={errors.span} hint="clear distance, post face to post face" />
      <MeasureField label="Baluster width" registration={register("balusterWidth")} value={values.balusterWidth} unit={display.unit} denominator={display.denominator} error={errors.balusterWidth} hint="e.g. 1 1/2 for a 2x2" />
      <fieldset className="space-y-2">
        <legend className="text-sm font-semibold">Every opening must be under</legend>
        <label className="flex min-h-touch items-center gap-2">
          <input type="radio" {...choice("limit", "level")} /> {limitText(GUARD_MAX_OPENING, display)} — deck, porch, landing
        </label>
        <label className="flex min-h-touch items-center gap-2">
          <input type="radio" {...choice("limit", "stair")} /> {limitText(STAIR_SIDE_OPENING, display)} — open side of a stair
        </label>
        <label className="flex min-h-touch items-center gap-2">
          <input type="radio" {...choice("limit", "other")} /> A limit I type (your local code)
        </label>
      </fieldset>
      {limitChoice === "other" ? (
        <MeasureField label="Largest opening" registration={register("maxOpening")} value={values.maxOpening} unit={display.unit} denominator={display.denominator} error={errors.maxOpening} hint="the sphere that must not pass" />
      ) : null}
    </>
  );

  const caution = (
    <div className="print:[&_aside]:text-xs">
      <CodeCaution>
        A guard is required where the walking surface is more than {limitText(new Fraction(30), display)} above the grade or floor below (R312.1.1); it
        must be at least {limitText(new Fraction(36), display)} tall (R312.1.2); and no opening may let a {limitText(GUARD_MAX_OPENING, display)} sphere
        pass (R312.1.3). A guard keeps people from falling: post and rail fastening is structural work for licensed practice.
      </CodeCaution>
    </div>
  );

  const results = result ? (
    <>
      <GuardDrawing result={result} display={display} />
      <GuardReadouts result={result} display={display} />
      {result.oneFewer && laidOut ? <OneFewerNote oneFewer={result.oneFewer} limit={result.maxOpening} count={result.count} span={result.span} display={display} /> : null}
      <WarningList warnings={result.warnings} />
      {caution}
      {result.members.length > 0 ? (
        <>
          <p className="text-sm text-ink-soft">Hook the tape on the face of the left post and mark every baluster from there.</p>
          <div className="print:hidden">
            <MarksTable members={result.members} display={display} memberName="Baluster" />
          </div>
          {/* On paper the marks run in two halves side by side, so a porch-length guard stays on one sheet. */}
          <div className="hidden gap-3 print:grid print:grid-cols-2 print:items-start print:[&_table]:text-xs print:[&_td]:py-0 print:[&_th]:py-0">
            <MarksTable members={result.members.slice(0, Math.ceil(result.members.length / 2))} display={display} memberName="Baluster" />
            {result.members.length > 1 ? <MarksTable members={result.members.slice(Math.ceil(result.members.length / 2))} display={display} memberName="Baluster" /> : null}
          </div>
        </>
      ) : null}
      <p className="text-sm text-ink-soft print:hidden">{result.limitNote}</p>
      <RoundingNote denominator={display.denominator} unit={display.unit} />
    </>
  ) : (
    <>
      <FixFieldsNote errorCount={Object.keys(errors).length} what="layout" />
      {caution}
    </>
  );

  return (
    <CalculatorFrame
      kind="guard-spacing"
      title="Guard spacing"
      inputs={inputs}
      results={results}
      query={query}
      compact={compact}
      signedIn={signedIn}
      sheetSummary={
        result && [
          ["span", `${lengthText(result.span, display)} between posts`],
          ["balusters", `${result.count} × ${lengthText(result.memberWidth, display)}`],
          ["openings under", limitText(result.maxOpening, display)],
        ]
      }
    />
  );
}

/** Why the count is what it is: the layout with one baluster fewer, which the sphere passes. */
function OneFewerNote({ oneFewer, limit, count, span, display }: { oneFewer: { count: number; opening: Fraction }; limit: Fraction; count: number; span: Fraction; display: Display }) {
  const rounded = lengthText(oneFewer.opening, display);
  const { exact, error } = exactAndError(oneFewer.opening, display);
  const sphere = limitText(limit, display);
  return (
    <p className="card p-3 text-sm print:hidden" data-testid="one-fewer">
      <strong>Why {count}?</strong>{" "}
      {oneFewer.count === 0 ? (
        <>
          With no baluster at all, the opening would be the whole span, <span className="measure font-semibold">{lengthText(span, display)}</span>
        </>
      ) : (
        <>
          With one baluster fewer ({oneFewer.count}), every opening would be <span className="measure font-semibold">{rounded}</span>
          {error === "no rounding" ? "" : <span className="measure text-ink-soft"> (exact {exact})</span>}
        </>
      )}{" "}
      — a {sphere} sphere passes through that. So {count} is the fewest that keeps the sphere out.
    </p>
  );
}

// On paper the readouts go six across without their notes; the exact value and error stay.
function GuardReadouts({ result, display }: { result: GuardSpacingResult; display: Display }) {
  const laidOut = result.members.length === result.count;
  const limit = limitText(result.maxOpening, display);
  return (
    <div className="print:[&>dl]:grid-cols-6 print:[&_dd:first-of-type]:text-lg print:[&_dd.mt-1]:hidden">
      <ReadoutGrid>
        <CountReadout label="Balusters" value={result.count} note={`the fewest that keep every opening under ${limit}`} />
        <CountReadout label="Spaces" value={result.spaces} note="balusters + 1" />
        {laidOut ? <Readout label="Opening" value={result.gap} display={display} note={`free space ÷ ${result.spaces} ${result.spaces === 1 ? "space" : "spaces"}`} /> : null}
        {laidOut && result.count > 0 ? <Readout label="On centre" value={result.onCenter} display={display} note="opening + baluster width" /> : null}
        <Readout label="Balusters take up" value={result.totalMemberWidth} display={display} />
        {laidOut ? <Readout label="Free space" value={result.freeSpace} display={display} note="span − balusters" /> : null}
      </ReadoutGrid>
    </div>
  );
}
