import type { ReactNode } from "react";
import type { Fraction } from "@/lib/layout/core";
import type { Unit, Warning } from "@/lib/layout/core";
import { formatMeasure } from "@/lib/layout/measure";

export type Display = { unit: Unit; denominator: number };

// Inches by default, as a tape reads and as layouts are marked; feet-inches where a long total reads better.
export function lengthText(value: Fraction, { unit, denominator }: Display, style: "inches" | "feet-inches" = "inches"): string {
  return formatMeasure(value, { unit, denominator, style: unit === "in" ? style : undefined }).text;
}

/** "exact 22.78125″ · rounded 1/32″ long" — the three things every result shows. */
export function exactAndError(value: Fraction, display: Display): { exact: string; error: string } {
  const { error } = formatMeasure(value, { unit: display.unit, denominator: display.denominator });
  // The exact value as a fraction when it does not end in a few decimals: 227/14 is exact, 16.21429 is not.
  const exactText = display.unit === "mm" ? `${exactNumber(value.mul(127, 5))} mm` : `${exactNumber(value)}″`;
  const sign = error.s < 0n ? "short" : "long";
  const errorText =
    error.n === 0n
      ? "no rounding"
      : display.unit === "mm"
        ? `${trimDecimal(Math.abs(error.mul(127, 5).valueOf()), 2)} mm ${sign}`
        : `${error.abs().toFraction(true)}″ ${sign}`;
  return { exact: exactText, error: errorText };
}

function exactNumber(value: Fraction): string {
  const d = value.d;
  let rest = d;
  for (const p of [2n, 5n]) while (rest % p === 0n) rest /= p;
  if (rest === 1n && d <= 1000n) return value.toString();
  return value.toFraction(true);
}

function trimDecimal(n: number, places: number): string {
  return n.toFixed(places).replace(/\.?0+$/, "");
}

/** A result: the rounded value large, and beneath it the exact value and the rounding error. */
export function Readout({ label, value, display, style, note }: { label: string; value: Fraction; display: Display; style?: "inches" | "feet-inches"; note?: ReactNode }) {
  const { exact, error } = exactAndError(value, display);
  return (
    <div className="rounded border border-rule bg-paper-raised p-3">
      <dt className="text-xs font-semibold uppercase tracking-wide text-ink-faint">{label}</dt>
      <dd className="measure text-lg font-bold whitespace-nowrap sm:text-xl">{lengthText(value, display, style)}</dd>
      <dd className="measure text-xs text-ink-soft">
        exact {exact} · {error}
      </dd>
      {note ? <dd className="mt-1 text-xs text-ink-soft">{note}</dd> : null}
    </div>
  );
}

export function CountReadout({ label, value, note }: { label: string; value: number | string; note?: ReactNode }) {
  return (
    <div className="rounded border border-rule bg-paper-raised p-3">
      <dt className="text-xs font-semibold uppercase tracking-wide text-ink-faint">{label}</dt>
      <dd className="measure text-lg font-bold whitespace-nowrap sm:text-xl">{value}</dd>
      {note ? <dd className="mt-1 text-xs text-ink-soft">{note}</dd> : null}
    </div>
  );
}

export function ReadoutGrid({ children }: { children: ReactNode }) {
  return <dl className="grid grid-cols-2 gap-2 sm:grid-cols-3">{children}</dl>;
}

export function WarningList({ warnings }: { warnings: Warning[] }) {
  if (warnings.length === 0) return null;
  return (
    <ul className="space-y-2" aria-label="Warnings">
      {warnings.map((w, i) => (
        <li key={`${w.code}-${i}`} data-warning={w.code} className="rounded border-l-4 border-caution-edge bg-caution-bg px-3 py-2 text-sm text-ink">
          {w.message}
        </li>
      ))}
    </ul>
  );
}

export function RoundingNote({ denominator, unit }: { denominator: number; unit: Unit }) {
  return (
    <p className="text-xs text-ink-soft">
      {unit === "in" ? `Rounded to the nearest 1/${denominator}″` : "Rounded to the nearest millimetre"}; an exact half rounds away from zero (up, for a
      length). Every mark is measured from the left end, never by adding rounded gaps.
    </p>
  );
}

/** Stairs and guards keep people from falling: say so, and defer to the local code. */
export function CodeCaution({ children }: { children?: ReactNode }) {
  return (
    <aside className="rounded border-l-4 border-caution-edge bg-caution-bg p-3 text-sm text-ink">
      <p>
        <strong>Check your local code.</strong> These limits follow the model residential code (IRC 2018); the code adopted where you build
        and your building official have the final word. {children}
      </p>
    </aside>
  );
}

/** In place of the results while the form has a mistake: the fields themselves say what is wrong. */
export function FixFieldsNote({ errorCount, what }: { errorCount: number; what: string }) {
  return (
    <p className="card p-4 text-ink-soft">
      Fix the highlighted {errorCount > 1 ? "fields" : "field"} to see the {what}.
    </p>
  );
}
