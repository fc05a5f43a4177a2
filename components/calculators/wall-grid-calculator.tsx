"use client";

import { useId, useMemo } from "react";
import { ZERO, type Fraction, type Unit } from "@/lib/layout/core";
import { formatMeasure } from "@/lib/layout/measure";
import { DEFAULT_STUD_SPACING, wallGrid, type GridCutList } from "@/lib/layout/wall-grid";
import { wallGridSchema } from "@/lib/layout/wall-grid-schema";
import { fieldErrorsFrom } from "@/lib/errors";
import { CalculatorFrame } from "./calculator-frame";
import { convertLengths } from "./convert-units";
import { cutListHref } from "./cut-list-codec";
import { MarksTable } from "./marks-table";
import { MeasureField } from "./measure-field";
import { CountReadout, FixFieldsNote, Readout, ReadoutGrid, RoundingNote, WarningList, lengthText } from "./readouts";
import { UnitPrecisionFields } from "./unit-precision-fields";
import { flatCodec, useUrlForm, type SearchParamsRecord } from "./use-url-form";
import { LengthListField, MemberWidthField, splitList } from "./wall-grid-fields";
import { WallGridDrawing } from "./wall-grid-drawing";
import { GridCutLists, PieceListTable, RailsTable, RowHeightsTable, StudCheckTable, WallGridWorking } from "./wall-grid-tables";

export type WallGridValues = {
  unit: string;
  denominator: string;
  wallWidth: string;
  wallHeight: string;
  topRailWidth: string;
  bottomRailWidth: string;
  baseTrimHeight: string;
  verticalWidth: string;
  by: string; // "count" | "maxBay"
  verticalCount: string;
  maxBay: string;
  rows: string;
  rowWidth: string;
  studs: string; // "on" | "off"
  firstStudCenter: string;
  studSpacing: string;
  endStuds: string; // "true" | "false"
  stock: string;
  kerf: string;
  trim: string;
};

// The demo hallway wall (invented): 141 1/2" × 8', 1x4 battens and bottom rail (3 1/2" actual,
// PS 20), a 1x6 top rail, over 3 1/2" of existing base; one row makes it a grid. Studs 16" o.c.
// from the left end (IRC Table R602.3(5)); 8', 10' and 12' stock; a 1/8" full-kerf blade.
export const WALL_GRID_DEFAULTS: WallGridValues = {
  unit: "in",
  denominator: "16",
  wallWidth: "141 1/2",
  wallHeight: "96",
  topRailWidth: "5 1/2",
  bottomRailWidth: "3 1/2",
  baseTrimHeight: "3 1/2",
  verticalWidth: "3 1/2",
  by: "count",
  verticalCount: "7",
  maxBay: "24",
  rows: "1",
  rowWidth: "",
  studs: "on",
  firstStudCenter: "16",
  studSpacing: "16",
  endStuds: "true",
  stock: "96, 120, 144",
  kerf: "1/8",
  trim: "0",
};

const LENGTH_FIELDS = ["wallWidth", "wallHeight", "topRailWidth", "bottomRailWidth", "baseTrimHeight", "verticalWidth", "maxBay", "rowWidth", "firstStudCenter", "studSpacing", "kerf", "trim"] as const;

/** A length for another form to read back exactly: 19 23/44 stays 19 23/44, not 19 1/2. */
function exactTyped(value: Fraction, unit: Unit): string {
  if (unit === "mm") return formatMeasure(value, { unit: "mm", mmDecimals: 1 }).text.replace(/\.0 mm$/, " mm");
  return value.mul(64).d === 1n ? formatMeasure(value, { unit: "in", denominator: 64, style: "inches" }).text.replace(/"$/, "") : value.toFraction(true);
}

type Props = { initial?: SearchParamsRecord; start?: Partial<WallGridValues>; compact?: boolean; signedIn?: boolean };

export function WallGridCalculator({ initial, start, compact = false, signedIn = false }: Props) {
  const defaults = { ...WALL_GRID_DEFAULTS, ...start };
  const { form, choice, values, query } = useUrlForm({ defaults, initial, codec: flatCodec<WallGridValues>(), syncUrl: !compact });
  const { register, setValue, getValues } = form;
  const reactId = useId();
  const idPrefix = compact ? `wall-grid-${reactId.replace(/[^a-zA-Z0-9]/g, "")}` : "wall-grid";
  const studsOn = values.studs === "on";

  const parsed = useMemo(
    () =>
      wallGridSchema.safeParse({
        ...values,
        verticalCount: values.by === "count" ? values.verticalCount : "",
        maxBay: values.by === "maxBay" ? values.maxBay : "",
        firstStudCenter: studsOn ? values.firstStudCenter : "",
        studSpacing: studsOn ? values.studSpacing : "",
        endStuds: studsOn ? values.endStuds : undefined,
        stock: splitList(values.stock),
        trim: values.trim,
      }),
    [values, studsOn],
  );
  const errors = parsed.success ? {} : fieldErrorsFrom(parsed.error.issues);
  const stockError = Object.entries(errors).find(([key]) => key === "stock" || key.startsWith("stock."))?.[1];
  const request = parsed.success ? parsed.data : null;
  const result = useMemo(() => (request ? wallGrid(request) : null), [request]);
  const display = { unit: request ? request.unit : values.unit === "mm" ? "mm" : "in", denominator: request ? request.denominator : 16 } as const;
  const field = { unit: display.unit, denominator: display.denominator };
  const pick = (key: keyof WallGridValues) => (text: string) => setValue(key, text, { shouldDirty: true });

  const unitField = (unit: "in" | "mm") => choice("unit", unit, {
    onChange: (event) => {
      const to = event.target.value as Unit;
      const from: Unit = to === "mm" ? "in" : "mm";
      const current = getValues();
      for (const [key, value] of Object.entries(convertLengths(current, [...LENGTH_FIELDS], from, to))) setValue(key as keyof WallGridValues, value as string);
      const stock = splitList(current.stock).map((item) => Object.values(convertLengths({ item }, ["item"], from, to))[0] ?? item);
      setValue("stock", stock.join(", "));
    },
  });

  const inputs = (
    <>
      <UnitPrecisionFields unit={unitField} denominator={register("denominator")} unitValue={values.unit} />
      <fieldset className="space-y-1">
        <legend className="mb-1 text-base font-semibold">The wall</legend>
        <MeasureField label="Wall width" registration={register("wallWidth")} value={values.wallWidth} {...field} error={errors.wallWidth} hint="wall to wall, at the height of the rails" />
        <MeasureField label="Wall height" registration={register("wallHeight")} value={values.wallHeight} {...field} error={errors.wallHeight} hint="floor to ceiling" />
      </fieldset>
      <fieldset className="space-y-1">
        <legend className="mb-1 text-base font-semibold">Rails and base trim</legend>
        <MemberWidthField label="Top rail width" registration={register("topRailWidth")} value={values.topRailWidth} {...field} error={errors.topRailWidth} hint="0 for no top rail" onPick={pick("topRailWidth")} />
        <MemberWidthField label="Bottom rail width" registration={register("bottomRailWidth")} value={values.bottomRailWidth} {...field} error={errors.bottomRailWidth} hint="sits on the base trim" onPick={pick("bottomRailWidth")} />
        <MeasureField label="Existing base trim height" registration={register("baseTrimHeight")} value={values.baseTrimHeight} {...field} error={errors.baseTrimHeight} whenBlank="blank: no base trim" />
      </fieldset>
      <fieldset className="space-y-2">
        <legend className="mb-1 text-base font-semibold">Verticals (battens)</legend>
        <MemberWidthField label="Vertical width" registration={register("verticalWidth")} value={values.verticalWidth} {...field} error={errors.verticalWidth} hint="e.g. 3 1/2 for a 1x4" onPick={pick("verticalWidth")} />
        <div role="radiogroup" aria-label="Decide the verticals by" className="space-y-1">
          <label className="flex min-h-touch items-center gap-2">
            <input type="radio" {...choice("by", "count")} /> How many verticals (one flush at each end)
          </label>
          <label className="flex min-h-touch items-center gap-2">
            <input type="radio" {...choice("by", "maxBay")} /> The widest bay allowed
          </label>
        </div>
        {values.by === "count" ? (
          <div>
            <label htmlFor={`${idPrefix}-count`} className="mb-1 block text-sm font-semibold">
              Number of verticals
            </label>
            <input id={`${idPrefix}-count`} inputMode="numeric" autoComplete="off" className="input measure" aria-invalid={errors.verticalCount ? true : undefined} aria-describedby={`${idPrefix}-count-error`} {...register("verticalCount")} />
            <p id={`${idPrefix}-count-error`} className="mt-1 min-h-5 text-xs font-semibold text-danger">
              {errors.verticalCount}
            </p>
          </div>
        ) : (
          <MeasureField label="Widest bay allowed" registration={register("maxBay")} value={values.maxBay} {...field} error={errors.maxBay ?? errors.verticalCount} hint="the fewest verticals that keep every bay this wide or less" />
        )}
      </fieldset>
      <fieldset className="space-y-1">
        <legend className="mb-1 text-base font-semibold">Rows</legend>
        <div>
          <label htmlFor={`${idPrefix}-rows`} className="mb-1 block text-sm font-semibold">
            Rows of horizontal rails
          </label>
          <input id={`${idPrefix}-rows`} inputMode="numeric" autoComplete="off" className="input measure" aria-invalid={errors.rows ? true : undefined} aria-describedby={`${idPrefix}-rows-note`} {...register("rows")} />
          <p id={`${idPrefix}-rows-note`} className={`mt-1 min-h-5 text-xs ${errors.rows ? "font-semibold text-danger" : "text-ink-soft"}`}>
            {errors.rows ?? "0 is plain board and batten; rows space evenly between the rails"}
          </p>
        </div>
        {values.rows.trim() !== "" && values.rows.trim() !== "0" ? (
          <MemberWidthField label="Row rail width" registration={register("rowWidth")} value={values.rowWidth} {...field} error={errors.rowWidth} whenBlank="blank: same as the verticals" onPick={pick("rowWidth")} />
        ) : null}
      </fieldset>
      <fieldset className="space-y-1">
        <legend className="mb-1 text-base font-semibold">Studs behind the wall</legend>
        <label className="flex min-h-touch items-center gap-2">
          <input type="checkbox" checked={studsOn} onChange={(event) => setValue("studs", event.target.checked ? "on" : "off")} /> Check which verticals land on a stud
        </label>
        {studsOn ? (
          <>
            <MeasureField label="First stud centre" registration={register("firstStudCenter")} value={values.firstStudCenter} {...field} error={errors.firstStudCenter} hint="from the left end; find it with a stud finder" />
            <MeasureField label="Stud spacing (on centre)" registration={register("studSpacing")} value={values.studSpacing} {...field} error={errors.studSpacing} hint="16 is usual, 24 in some walls" />
            <label className="flex min-h-touch items-center gap-2">
              <input type="checkbox" checked={values.endStuds !== "false"} onChange={(event) => setValue("endStuds", event.target.checked ? "true" : "false")} /> A stud at each end of the wall
            </label>
          </>
        ) : null}
      </fieldset>
      <fieldset className="space-y-1">
        <legend className="mb-1 text-base font-semibold">Stock and saw</legend>
        <LengthListField label="Stock lengths" registration={register("stock")} value={values.stock} unit={display.unit} error={stockError} hint="lengths the yard sells, separated by commas: 96, 120, 144 or 8', 10', 12'" />
        <MeasureField label="Kerf (saw blade width)" registration={register("kerf")} value={values.kerf} {...field} error={errors.kerf} hint="1/8 for a full-kerf blade" />
        <MeasureField label="End trim per board" registration={register("trim")} value={values.trim} {...field} error={errors.trim} hint="cut off each board's factory end first; 0 for none" />
      </fieldset>
    </>
  );

  const toCutList = (list: GridCutList) =>
    cutListHref({
      unit: display.unit,
      denominator: String(display.denominator),
      pieces: list.pieces.map((piece) => ({ label: piece.label, length: exactTyped(piece.length, display.unit), quantity: String(piece.quantity) })),
      stock: splitList(values.stock).map((length) => ({ length, price: "" })),
      kerf: values.kerf,
      trim: values.trim,
    });

  const results = result ? (
    // Zoomed on paper so the demo wall's whole sheet fits one page.
    <div className="space-y-4 print:space-y-3 print:[zoom:0.86]">
      <WallGridDrawing result={result} display={display} idPrefix={idPrefix} />
      <div className="print:hidden">
      <ReadoutGrid>
        <Readout label="Vertical cut length" value={result.verticalLength.exact} display={display} note="height − top rail − bottom rail − base trim" />
        <Readout label={result.rows.length > 0 ? "Bay (row rail cut)" : "Bay"} value={result.bay.exact} display={display} note={`(wall − verticals) ÷ ${result.bays.length} bays`} />
        <Readout label="Verticals on centre" value={result.verticalLayout.onCenter} display={display} note="bay + vertical width" />
        <CountReadout label="Verticals" value={result.verticals.length} note={`${result.bays.length} bays`} />
        {result.rows.length > 0 ? <Readout label="Panel height" value={result.panelHeight.exact} display={display} note={`${result.rows.length + 1} panels between the rails`} /> : null}
        <CountReadout label="Boards to buy" value={result.boardCount} note={result.cutLists.every((list) => list.result.optimal) ? "proven fewest" : "good, not proven fewest"} />
      </ReadoutGrid>
      </div>
      <WallGridWorking result={result} display={display} />
      <WarningList warnings={result.warnings} />
      <div className="space-y-4 print:block print:columns-2 print:gap-3 print:space-y-0 print:text-xs print:[&_table]:text-xs print:[&_caption]:text-xs print:[&_td]:px-1.5 print:[&_td]:py-0.5 print:[&_th]:px-1.5 print:[&_th]:py-0.5 print:[&>*]:mb-2 print:[&>*]:break-inside-avoid">
        <PieceListTable result={result} display={display} />
        {result.verticals.length > 0 ? <MarksTable members={result.verticals} display={display} memberName="Vertical" /> : null}
        {result.studs.length > 0 && result.verticals.length > 0 ? <StudCheckTable result={result} display={display} /> : null}
        {result.rows.length > 0 ? <RowHeightsTable result={result} display={display} /> : null}
        <RailsTable result={result} display={display} />
      </div>
      <GridCutLists result={result} display={display} trim={request?.trim ?? ZERO} cutListHref={toCutList} idPrefix={idPrefix} />
      <RoundingNote denominator={display.denominator} unit={display.unit} />
    </div>
  ) : (
    <FixFieldsNote errorCount={Object.keys(errors).length} what="layout" />
  );

  const t = (v: Fraction) => lengthText(v, display);
  return (
    <CalculatorFrame
      kind="wall-grid"
      title="Wall grid"
      inputs={inputs}
      results={results}
      query={query}
      compact={compact}
      signedIn={signedIn}
      sheetSummary={
        result && [
          ["wall", `${t(result.wallWidth)} × ${t(result.wallHeight)}`],
          ["verticals", `${result.verticals.length} × ${t(result.verticalLayout.memberWidth)}`],
          ["rails", `top ${t(result.rails.top.width)}, bottom ${t(result.rails.bottom.width)}, base ${t(result.rails.bottom.bottom)}`],
          ["rows", String(result.rows.length)],
          ["studs", request?.studs ? `${t(request.studs.studSpacing ?? DEFAULT_STUD_SPACING)} o.c. from ${t(request.studs.firstStudCenter)}` : "not checked"],
        ]
      }
    />
  );
}
