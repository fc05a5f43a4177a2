"use client";

import { useId, type ReactNode } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";
import type { Fraction, Unit } from "@/lib/layout/core";
import { DRY_WIDTH, parseNominal } from "@/lib/layout/lumber";
import { formatMeasure, parseMeasure } from "@/lib/layout/measure";
import { MeasureField } from "./measure-field";

const NOMINAL_WIDTHS = Object.keys(DRY_WIDTH).map(Number);

/** A length typed the way the form keeps it: inches to 1/64″, or millimetres to 0.1. */
export function typedLength(value: Fraction, unit: Unit): string {
  return unit === "mm"
    ? formatMeasure(value, { unit: "mm", mmDecimals: 1 }).text.replace(/\.0 mm$/, " mm")
    : formatMeasure(value, { unit: "in", denominator: 64, style: "inches" }).text;
}

/** "1x4" when a face width is a PS 20 dry dressed 1x width, for labels beside the actual size. */
export function nominalName(width: Fraction): string | null {
  const nominal = NOMINAL_WIDTHS.find((w) => DRY_WIDTH[w].equals(width));
  return nominal === undefined ? null : `1x${nominal}`;
}

/**
 * Stock typed as one list, "96, 120, 144" or "8', 10', 12'". Commas and semicolons part the
 * lengths because a space already belongs to tape notation (22 3/4).
 */
export function splitList(text: string): string[] {
  return text.trim() === "" ? [] : text.split(/[,;]/).map((item) => item.trim());
}

type WidthProps = {
  label: string;
  registration: UseFormRegisterReturn;
  value: string;
  unit: Unit;
  denominator: number;
  error?: string;
  hint?: string;
  /** Fills the field with a nominal board's actual width. */
  onPick: (text: string) => void;
  /** Blank is allowed; this says what it means (see MeasureField). */
  whenBlank?: string;
};

/** A face-width field with a shortcut: pick 1x4 and the field gets 3 1/2″, still a typed length. */
export function MemberWidthField({ label, registration, value, unit, denominator, error, hint, onPick, whenBlank }: WidthProps) {
  const pickerId = useId();
  return (
    <div className="flex items-start gap-2">
      <div className="min-w-0 flex-1">
        <MeasureField label={label} registration={registration} value={value} unit={unit} denominator={denominator} error={error} hint={hint} whenBlank={whenBlank} />
      </div>
      <div className="w-24 shrink-0">
        <label htmlFor={pickerId} className="mb-1 block text-sm font-semibold">
          <span className="sr-only">{label}: </span>Board
        </label>
        <select
          id={pickerId}
          className="input px-2"
          value=""
          onChange={(event) => {
            const lumber = parseNominal(event.target.value);
            if (lumber) onPick(typedLength(lumber.actual.width, unit));
          }}
        >
          <option value="">size…</option>
          {NOMINAL_WIDTHS.map((w) => (
            <option key={w} value={`1x${w}`}>
              1x{w}
            </option>
          ))}
        </select>
      </div>
    </div>
  );
}

type ListProps = { label: string; registration: UseFormRegisterReturn; value: string; unit: Unit; error?: string; hint: ReactNode };

/** The stock lengths as one comma-separated box, each length read back as feet and inches. */
export function LengthListField({ label, registration, value, unit, error, hint }: ListProps) {
  const id = useId();
  const items = splitList(value);
  const readings = items.map((item) => (item === "" ? null : parseMeasure(item, unit)));
  const unreadable = readings.findIndex((r) => r === null || !r.ok);
  const problem =
    items.length === 0
      ? "Enter at least one stock length."
      : unreadable >= 0
        ? `Length ${unreadable + 1}: ${readings[unreadable] === null ? "it is empty" : (readings[unreadable] as { ok: false; error: { message: string } }).error.message}`
        : error;
  const reading = readings.map((r) => (r && r.ok ? formatMeasure(r.value, { unit, denominator: 64, style: unit === "in" ? "feet-inches" : undefined, mmDecimals: 1 }).text : "")).join(", ");
  return (
    <div>
      <label htmlFor={id} className="mb-1 block text-sm font-semibold">
        {label}
      </label>
      <input id={id} type="text" autoComplete="off" spellCheck={false} className="input measure" aria-invalid={problem ? true : undefined} aria-describedby={`${id}-reading ${id}-hint`} {...registration} />
      <p id={`${id}-reading`} aria-live="polite" className={`mt-1 min-h-5 text-xs ${problem ? "font-semibold text-danger" : "text-ink-soft"}`}>
        {problem ? problem : <>reads as <span className="measure">{reading}</span></>}
      </p>
      <p id={`${id}-hint`} className="text-xs text-ink-soft">
        {hint}
      </p>
    </div>
  );
}
