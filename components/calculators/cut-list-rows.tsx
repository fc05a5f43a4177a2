"use client";

import { useId, useRef, useState } from "react";
import { useFieldArray, type UseFormReturn } from "react-hook-form";
import type { Unit } from "@/lib/layout/core";
import { MAX_PIECE_ROWS, MAX_STOCK_ROWS } from "@/lib/layout/cut-list-schema";
import type { FieldErrors } from "@/lib/errors";
import type { CutListPieceRow, CutListStockRow, CutListValues } from "./cut-list-codec";
import { MeasureField } from "./measure-field";

type RowsProps = { form: UseFormReturn<CutListValues>; values: CutListValues; errors: FieldErrors; unit: Unit; denominator: number };

type Removed<R> = { index: number; row: R; name: string } | null;

/** The undo line after a removal: the row comes back where it was, and focus lands on the button. */
function UndoRemoval({ removed, onUndo, undoRef }: { removed: Removed<unknown>; onUndo: () => void; undoRef: React.RefObject<HTMLButtonElement | null> }) {
  return (
    <p aria-live="polite" className="min-h-5 text-sm">
      {removed ? (
        <>
          Removed {removed.name}.{" "}
          <button ref={undoRef} type="button" className="font-semibold text-chalk-dark underline underline-offset-2" onClick={onUndo}>
            Undo
          </button>
        </>
      ) : null}
    </p>
  );
}

export function PieceRows({ form, values, errors, unit, denominator }: RowsProps) {
  const { control, register } = form;
  const { fields, append, remove, insert } = useFieldArray({ control, name: "pieces" });
  const [removed, setRemoved] = useState<Removed<CutListPieceRow>>(null);
  const undoRef = useRef<HTMLButtonElement>(null);
  const addRef = useRef<HTMLButtonElement>(null);
  const id = useId();

  const removeRow = (index: number) => {
    const row = values.pieces[index];
    remove(index);
    setRemoved({ index, row, name: row.label.trim() ? `“${row.label.trim()}”` : `piece ${index + 1}` });
    // After the row goes, its buttons are gone too; the undo button is the next useful place.
    requestAnimationFrame(() => (undoRef.current ?? addRef.current)?.focus());
  };

  return (
    <fieldset className="space-y-2">
      <legend className="mb-1 text-base font-semibold">Pieces to cut</legend>
      <ol className="space-y-2">
        {fields.map((field, i) => {
          const row = values.pieces[i] ?? { label: "", length: "", quantity: "" };
          const quantityError = errors[`pieces.${i}.quantity`];
          return (
            <li key={field.id} className="rounded border border-rule bg-paper-raised p-2" data-piece-row={i + 1}>
              <div className="grid grid-cols-[1fr_auto] items-end gap-2">
                <div>
                  <label htmlFor={`${id}-label-${i}`} className="mb-1 block text-sm font-semibold">
                    Piece {i + 1} label
                  </label>
                  <input id={`${id}-label-${i}`} className="input" autoComplete="off" placeholder="e.g. batten" {...register(`pieces.${i}.label`)} />
                </div>
                <button type="button" className="btn-quiet px-3" aria-label={`Remove piece ${i + 1}${row.label.trim() ? ` (${row.label.trim()})` : ""}`} onClick={() => removeRow(i)}>
                  Remove
                </button>
              </div>
              <div className="mt-2 grid grid-cols-[1fr_5.5rem] gap-2">
                <MeasureField label={`Piece ${i + 1} length`} registration={register(`pieces.${i}.length`)} value={row.length} unit={unit} denominator={denominator} error={errors[`pieces.${i}.length`]} />
                <div>
                  <label htmlFor={`${id}-qty-${i}`} className="mb-1 block text-sm font-semibold">
                    <span className="sr-only">Piece {i + 1} </span>Qty
                  </label>
                  <input
                    id={`${id}-qty-${i}`}
                    inputMode="numeric"
                    autoComplete="off"
                    className="input measure"
                    aria-invalid={quantityError ? true : undefined}
                    aria-describedby={`${id}-qty-${i}-error`}
                    {...register(`pieces.${i}.quantity`)}
                  />
                  <p id={`${id}-qty-${i}-error`} className="mt-1 min-h-5 text-xs font-semibold text-danger">
                    {quantityError}
                  </p>
                </div>
              </div>
            </li>
          );
        })}
      </ol>
      {errors.pieces ? <p className="text-sm font-semibold text-danger">{errors.pieces}</p> : null}
      <UndoRemoval
        removed={removed}
        undoRef={undoRef}
        onUndo={() => {
          if (!removed) return;
          insert(Math.min(removed.index, fields.length), removed.row);
          setRemoved(null);
        }}
      />
      <button
        ref={addRef}
        type="button"
        className="btn-quiet"
        disabled={fields.length >= MAX_PIECE_ROWS}
        onClick={() => {
          setRemoved(null);
          append({ label: "", length: "", quantity: "1" }, { shouldFocus: true, focusName: `pieces.${fields.length}.label` });
        }}
      >
        Add a piece
      </button>
    </fieldset>
  );
}

export function StockRows({ form, values, errors, unit, denominator }: RowsProps) {
  const { control, register } = form;
  const { fields, append, remove, insert } = useFieldArray({ control, name: "stock" });
  const [removed, setRemoved] = useState<Removed<CutListStockRow>>(null);
  const undoRef = useRef<HTMLButtonElement>(null);
  const addRef = useRef<HTMLButtonElement>(null);
  const id = useId();

  const removeRow = (index: number) => {
    const row = values.stock[index];
    remove(index);
    setRemoved({ index, row, name: row.length.trim() ? `the ${row.length.trim()} stock` : `stock length ${index + 1}` });
    requestAnimationFrame(() => (undoRef.current ?? addRef.current)?.focus());
  };

  return (
    <fieldset className="space-y-2">
      <legend className="mb-1 text-base font-semibold">Stock lengths</legend>
      <p className="text-xs text-ink-soft">The board lengths you can buy. Give a price for every one to have the plan keep the cost down too.</p>
      <ol className="space-y-2">
        {fields.map((field, i) => {
          const row = values.stock[i] ?? { length: "", price: "" };
          const priceError = errors[`stock.${i}.price`];
          return (
            <li key={field.id} className="grid grid-cols-[1fr_5.5rem_auto] items-start gap-2" data-stock-row={i + 1}>
              <MeasureField label={`Stock ${i + 1} length`} registration={register(`stock.${i}.length`)} value={row.length} unit={unit} denominator={denominator} error={errors[`stock.${i}.length`]} />
              <div>
                <label htmlFor={`${id}-price-${i}`} className="mb-1 block text-sm font-semibold">
                  <span className="sr-only">Stock {i + 1} </span>Price $<span className="sr-only"> (optional)</span>
                </label>
                <input
                  id={`${id}-price-${i}`}
                  inputMode="decimal"
                  autoComplete="off"
                  className="input measure px-2"
                  placeholder="—"
                  aria-invalid={priceError ? true : undefined}
                  aria-describedby={`${id}-price-${i}-error`}
                  {...register(`stock.${i}.price`)}
                />
                <p id={`${id}-price-${i}-error`} className="mt-1 min-h-5 text-xs font-semibold text-danger">
                  {priceError}
                </p>
              </div>
              <button type="button" className="btn-quiet mt-[1.625rem] px-3" aria-label={`Remove stock ${i + 1}${row.length.trim() ? ` (${row.length.trim()})` : ""}`} onClick={() => removeRow(i)}>
                ✕
              </button>
            </li>
          );
        })}
      </ol>
      {errors.stock ? <p className="text-sm font-semibold text-danger">{errors.stock}</p> : null}
      <UndoRemoval
        removed={removed}
        undoRef={undoRef}
        onUndo={() => {
          if (!removed) return;
          insert(Math.min(removed.index, fields.length), removed.row);
          setRemoved(null);
        }}
      />
      <button
        ref={addRef}
        type="button"
        className="btn-quiet"
        disabled={fields.length >= MAX_STOCK_ROWS}
        onClick={() => {
          setRemoved(null);
          append({ length: "", price: "" }, { shouldFocus: true, focusName: `stock.${fields.length}.length` });
        }}
      >
        Add a stock length
      </button>
    </fieldset>
  );
}
