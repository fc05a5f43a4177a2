"use client";

import type { UseFormRegisterReturn } from "react-hook-form";

/** The two settings every calculator shares: inches or millimetres, and the precision to round to. */
/** `unit` gives each of the two radio buttons its registration. */
export function UnitPrecisionFields({ unit, denominator, unitValue }: { unit: (value: "in" | "mm") => UseFormRegisterReturn; denominator: UseFormRegisterReturn; unitValue: string }) {
  return (
    <div className="flex flex-wrap gap-4">
      <fieldset>
        <legend className="mb-1 text-sm font-semibold">Units</legend>
        <div className="flex overflow-hidden rounded border border-rule-strong">
          {(["in", "mm"] as const).map((u) => (
            <label key={u} className="flex min-h-touch cursor-pointer items-center px-3 has-[:checked]:bg-ink has-[:checked]:text-paper has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-chalk">
              <input type="radio" className="sr-only" {...unit(u)} />
              {u === "in" ? "inches" : "mm"}
            </label>
          ))}
        </div>
      </fieldset>
      {unitValue === "in" ? (
        <div>
          <label className="mb-1 block text-sm font-semibold" htmlFor={`${denominator.name}-select`}>
            Round to
          </label>
          <select id={`${denominator.name}-select`} className="input w-auto" {...denominator}>
            {[8, 16, 32, 64].map((d) => (
              <option key={d} value={String(d)}>
                1/{d}″
              </option>
            ))}
          </select>
        </div>
      ) : null}
    </div>
  );
}
