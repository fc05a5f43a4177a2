"use client";

import { useId } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";
import type { Unit } from "@/lib/layout/core";
import { formatMeasure, parseMeasure } from "@/lib/layout/measure";

type Props = {
  label: string;
  registration: UseFormRegisterReturn;
  value: string;
  unit: Unit;
  denominator: number;
  /** What a blank box means, e.g. `blank = 7 3/4″ (IRC R311.7.5.1)`. */
  whenBlank: string;
  error?: string;
};

/**
 * A length box that may be left empty: it reads tape notation and says what it read like
 * the required fields, but blank is a real answer (the code's value), not a mistake.
 */
export function OptionalMeasureField({ label, registration, value, unit, denominator, whenBlank, error }: Props) {
  const id = useId();
  const blank = value.trim() === "";
  const parsed = blank ? null : parseMeasure(value, unit);
  const problem = parsed && !parsed.ok ? parsed.error.message : blank ? undefined : error;
  const reading =
    parsed && parsed.ok ? formatMeasure(parsed.value, { unit, denominator: Math.max(denominator, 64), style: unit === "in" ? "feet-inches" : undefined, mmDecimals: 1 }).text : null;
  return (
    <div>
      <label htmlFor={id} className="mb-1 block text-sm font-semibold">
        {label} <span className="font-normal text-ink-faint">(optional)</span>
      </label>
      <input
        id={id}
        type="text"
        inputMode="text"
        autoComplete="off"
        spellCheck={false}
        className="input measure"
        aria-invalid={problem ? true : undefined}
        aria-describedby={`${id}-reading`}
        {...registration}
      />
      <p id={`${id}-reading`} aria-live="polite" className={`mt-1 min-h-5 text-xs ${problem ? "font-semibold text-danger" : "text-ink-soft"}`}>
        {problem ? problem : reading ? <>reads as <span className="measure">{reading}</span></> : whenBlank}
      </p>
    </div>
  );
}
