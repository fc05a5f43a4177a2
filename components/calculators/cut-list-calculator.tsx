"use client";

import { useId, useMemo } from "react";
import type { Unit } from "@/lib/layout/core";
import { cutList } from "@/lib/layout/cut-list";
import { cutListSchema } from "@/lib/layout/cut-list-schema";
import { fieldErrorsFrom } from "@/lib/errors";
import { CalculatorFrame } from "./calculator-frame";
import { convertLengths } from "./convert-units";
import { CutListBoards } from "./cut-list-boards";
import { cutListCodec, type CutListValues } from "./cut-list-codec";
import { PieceRows, StockRows } from "./cut-list-rows";
import { BoardCutTables, BuyTable, CutListVerdict, priceText } from "./cut-list-tables";
import { MeasureField } from "./measure-field";
import { CountReadout, FixFieldsNote, Readout, ReadoutGrid, RoundingNote, WarningList, lengthText } from "./readouts";
import { UnitPrecisionFields } from "./unit-precision-fields";
import { useUrlForm, type SearchParamsRecord } from "./use-url-form";

export type { CutListValues } from "./cut-list-codec";

// The 1x4 pieces of the demo hallway wall (invented): seven 83 1/2" verticals, six 19 1/2" row
// rails and the 141 1/2" bottom rail; 8', 10' and 12' boards at invented prices; a 1/8" full-kerf blade.
export const CUT_LIST_DEFAULTS: CutListValues = {
  unit: "in",
  denominator: "16",
  pieces: [
    { label: "vertical", length: "83 1/2", quantity: "7" },
    { label: "row rail", length: "19 1/2", quantity: "6" },
    { label: "bottom rail", length: "141 1/2", quantity: "1" },
  ],
  stock: [
    { length: "96", price: "7.98" },
    { length: "120", price: "9.98" },
    { length: "144", price: "12.48" },
  ],
  kerf: "1/8",
  trim: "",
};

const placedNote = (n: number) => `${n} piece${n === 1 ? "" : "s"} placed`;

type Props = { initial?: SearchParamsRecord; start?: Partial<CutListValues>; compact?: boolean; signedIn?: boolean };

export function CutListCalculator({ initial, start, compact = false, signedIn = false }: Props) {
  const defaults = { ...CUT_LIST_DEFAULTS, ...start };
  const { form, choice, values, query } = useUrlForm({ defaults, initial, codec: cutListCodec, syncUrl: !compact });
  const { register, setValue, getValues } = form;
  const reactId = useId();
  const idPrefix = compact ? `cut-list-${reactId.replace(/[^a-zA-Z0-9]/g, "")}` : "cut-list";

  const parsed = useMemo(
    () =>
      cutListSchema.safeParse({
        unit: values.unit,
        denominator: values.denominator,
        kerf: values.kerf,
        trim: values.trim,
        pieces: (values.pieces ?? []).map((row) => ({ label: row?.label ?? "", length: row?.length ?? "", quantity: row?.quantity ?? "" })),
        stock: (values.stock ?? []).map((row) => ({ length: row?.length ?? "", price: row?.price ?? "" })),
      }),
    [values],
  );
  const errors = parsed.success ? {} : fieldErrorsFrom(parsed.error.issues);
  const request = parsed.success ? parsed.data : null;
  const result = useMemo(() => (request ? cutList(request) : null), [request]);
  const display = { unit: request ? request.unit : values.unit === "mm" ? "mm" : "in", denominator: request ? request.denominator : 16 } as const;
  const field = { unit: display.unit, denominator: display.denominator };

  const unitField = (unit: "in" | "mm") => choice("unit", unit, {
    onChange: (event) => {
      const to = event.target.value as Unit;
      const from: Unit = to === "mm" ? "in" : "mm";
      const current = getValues();
      for (const [key, value] of Object.entries(convertLengths(current, ["kerf", "trim"], from, to))) setValue(key as "kerf" | "trim", value as string);
      current.pieces.forEach((row, i) => {
        const converted = convertLengths(row, ["length"], from, to).length;
        if (converted !== undefined) setValue(`pieces.${i}.length`, converted);
      });
      current.stock.forEach((row, i) => {
        const converted = convertLengths(row, ["length"], from, to).length;
        if (converted !== undefined) setValue(`stock.${i}.length`, converted);
      });
    },
  });

  const rows = { form, values, errors, ...field };
  const inputs = (
    <>
      <UnitPrecisionFields unit={unitField} denominator={register("denominator")} unitValue={values.unit} />
      <PieceRows {...rows} />
      <StockRows {...rows} />
      <fieldset className="space-y-1">
        <legend className="mb-1 text-base font-semibold">Saw</legend>
        <MeasureField label="Kerf (saw blade width)" registration={register("kerf")} value={values.kerf} {...field} error={errors.kerf} hint="1/8 for a full-kerf blade, 3/32 thin-kerf" />
        <MeasureField label="End trim per board" registration={register("trim")} value={values.trim} {...field} error={errors.trim} whenBlank="blank: no trim; the factory ends are used as they come" />
      </fieldset>
    </>
  );

  const trim = request?.trim;
  const pieceCount = request ? request.pieces.reduce((n, p) => n + p.quantity, 0) : 0;
  const results =
    result && request && trim !== undefined ? (
      // Zoomed on paper so a list of a few boards fits one page.
      <div className="space-y-4 print:space-y-3 print:[zoom:0.8] print:[&_caption]:text-xs print:[&_table]:text-xs print:[&_td]:py-0.5 print:[&_th]:py-0.5">
        <div className="print:hidden">
        <ReadoutGrid>
          <CountReadout label="Boards to buy" value={result.boardCount} note={result.byStock.map((s) => `${s.count} × ${lengthText(s.stockLength, display, "feet-inches")}`).join(", ") || "nothing to cut"} />
          {result.totalCost !== undefined ? <CountReadout label="Cost" value={priceText(result.totalCost)} note="every board priced" /> : null}
          <CountReadout label="Fewest possible" value={result.lowerBound} note="no plan can use fewer boards" />
          <CountReadout label="Waste" value={`${result.wastePercent.toFixed(1)}%`} note="kerfs, end trim and offcuts" />
          <Readout label="Pieces add up to" value={result.totalPieceLength} display={display} style="feet-inches" note={placedNote(pieceCount - result.unplaced.reduce((n, p) => n + p.quantity, 0))} />
          <Readout label="Stock bought" value={result.totalStockLength} display={display} style="feet-inches" />
        </ReadoutGrid>
        </div>
        <CutListVerdict result={result} />
        <WarningList warnings={result.warnings.filter((w) => w.code !== "not-proven-optimal")} />
        {result.boards.length > 0 ? (
          <>
            <BuyTable result={result} display={display} />
            <CutListBoards result={result} display={display} trim={trim} idPrefix={`${idPrefix}-boards`} />
            <BoardCutTables result={result} display={display} trim={trim} kerf={request.kerf} />
          </>
        ) : null}
        <RoundingNote denominator={display.denominator} unit={display.unit} />
      </div>
    ) : (
      <FixFieldsNote errorCount={Object.keys(errors).length} what="cut list" />
    );

  return (
    <CalculatorFrame
      kind="cut-list"
      title="Cut list"
      inputs={inputs}
      results={results}
      query={query}
      compact={compact}
      signedIn={signedIn}
      sheetSummary={
        request && [
          ["pieces", String(pieceCount)],
          ["stock", request.stock.map((s) => lengthText(s.length, display, "feet-inches") + (s.price !== undefined ? ` at ${priceText(s.price)}` : "")).join(", ")],
          ["kerf", lengthText(request.kerf, display)],
          ["trim", !request.trim || request.trim.n === 0n ? "none" : lengthText(request.trim, display)],
        ]
      }
    />
  );
}
