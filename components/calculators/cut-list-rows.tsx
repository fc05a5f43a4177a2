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

/**
 * Removing a row with an undo: the row comes back where it was, and focus moves to the undo
 * button (or the add button) because the removed row's own buttons are gone.
 */
function useUndoableRemoval<R>(count: number, remove: (index: number) => void, insert: (index: number, row: R) => void) {
  const [removed, setRemoved] = useState<Removed<R>>(null);
  const undoRef = useRef<HTMLButtonElement>(null);
  const addRef = useRef<HTMLButtonElement>(null);
  return {
    removed,
    undoRef,
    addRef,
    removeRow: (index: number, row: R, name: string) => {
      remove(index);
      setRemoved({ index, row, name });
      requestAnimationFrame(() => (undoRef.current ?? addRef.current)?.focus());
    },
    undo: () => {
      if (!removed) return;
      insert(Math.min(removed.index, count), removed.row);
      setRemoved(null);
    },
    forget: () => setRemoved(null),
  };
}

type Removal = ReturnType<typeof useUndoableRemoval<unknown>>;

/** Under a list of rows: the list's own error, the undo line after a removal, and the add button. */
function RowsFooter({ error, removal, disabled, onAdd, children }: { error?: string; removal: Pick<Removal, "removed" | "undoRef" | "addRef" | "undo">; disabled: boolean; onAdd: () => void; children: React.ReactNode }) {
  const { removed, undoRef, addRef, undo } = removal;
  return (
    <>
      {error ? <p className="text-sm font-semibold text-danger">{error}</p> : null}
      <p aria-live="polite" className="min-h-5 text-sm">
        {removed ? (
          <>
            Removed {removed.name}.{" "}
            <button ref={undoRef} type="button" className="font-semibold text-chalk-dark underline underline-offset-2" onClick={undo}>
              Undo
            </button>
          </>
        ) : null}
      </p>
      <button ref={addRef} type="button" className="btn-quiet" disabled={disabled} onClick={onAdd}>
        {children}
      </button>
    </>
  );
}

export function PieceRows({ form, values, errors, unit, denominator }: RowsProps) {
  const { control, register } = form;
  const { fields, append, remove, insert } = useFieldArray({ control, name: "pieces" });
  const removal = useUndoableRemoval<CutListPieceRow>(fields.length, remove, insert);
  const id = useId();

  const removeRow = (index: number) => {
    const row = values.pieces[index];
    removal.removeRow(index, row, row.label.trim() ? `“${row.label.trim()}”` : `piece ${index + 1}`);
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
      <RowsFooter
        error={errors.pieces}
        removal={removal}
        disabled={fields.length >= MAX_PIECE_ROWS}
        onAdd={() => {
          removal.forget();
          append({ label: "", length: "", quantity: "1" }, { shouldFocus: true, focusName: `pieces.${fields.length}.label` });
        }}
      >
        Add a piece
      </RowsFooter>
    </fieldset>
  );
}

export function StockRows({ form, values, errors, unit, denominator }: RowsProps) {
  const { control, register } = form;
  const { fields, append, remove, insert } = useFieldArray({ control, name: "stock" });
  const removal = useUndoableRemoval<CutListStockRow>(fields.length, remove, insert);
  const id = useId();

  const removeRow = (index: number) => {
    const row = values.stock[index];
    removal.removeRow(index, row, row.length.trim() ? `the ${row.length.trim()} stock` : `stock length ${index + 1}`);
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
      <RowsFooter
        error={errors.stock}
        removal={removal}
        disabled={fields.length >= MAX_STOCK_ROWS}
        onAdd={() => {
          removal.forget();
          append({ length: "", price: "" }, { shouldFocus: true, focusName: `stock.${fields.length}.length` });
        }}
      >
        Add a stock length
      </RowsFooter>
    </fieldset>
  );
}
