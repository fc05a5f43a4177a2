"use client";

import { useId, type InputHTMLAttributes } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";
import { formatMeasure, parseMeasure } from "@/lib/layout/measure";
import type { Unit } from "@/lib/layout/core";

type Props = {
  label: string;
  registration: UseFormRegisterReturn;
  value: string;
  unit: Unit;
  denominator: number;
  /** The schema's message for this field, when it rejected the value for another reason (a rule, not the notation). */
  error?: string;
  hint?: string;
  /**
   * Makes the box optional: blank is a real answer (a code value, "no base trim"), not a
   * mistake, and this text says what it means, e.g. `blank = 7 3/4″ (IRC R311.7.5.1)`.
   */
  whenBlank?: string;
  /** Says "(optional)" after the label, for forms where most boxes are required. */
  optionalTag?: boolean;
} & Omit<InputHTMLAttributes<HTMLInputElement>, "value">;

/**
 * A length field that accepts tape notation and says what it read (`reads as 1' 10 3/4"`),
 * or what it could not read, as the user types.
 */
export function MeasureField({ label, registration, value, unit, denominator, error, hint, whenBlank, optionalTag, className, ...rest }: Props) {
  const id = useId();
  const blank = value.trim() === "";
  const parsed = blank ? null : parseMeasure(value, unit);
  const problem = parsed && !parsed.ok ? parsed.error.message : blank && whenBlank === undefined ? "Enter a length." : error;
  const reading =
    parsed && parsed.ok ? formatMeasure(parsed.value, { unit, denominator: Math.max(denominator, 64), style: unit === "in" ? "feet-inches" : undefined, mmDecimals: 1 }).text : null;
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1 block text-sm font-semibold">
        {label}
        {optionalTag ? <> <span className="font-normal text-ink-faint">(optional)</span></> : null}
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
        {...rest}
      />
      <p id={`${id}-reading`} aria-live="polite" className={`mt-1 min-h-5 text-xs ${problem ? "font-semibold text-danger" : "text-ink-soft"}`}>
        {problem ? problem : reading ? <>reads as <span className="measure">{reading}</span></> : blank && whenBlank !== undefined ? whenBlank : hint}
      </p>
    </div>
  );
}
