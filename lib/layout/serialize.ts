// Engine results hold exact Fractions; JSON cannot. Every Fraction in a result is a length
// in inches, so each becomes the API's measurement object { exact, value, text } in the
// unit the caller asked for. Everything else passes through unchanged.
import { Fraction, type Unit } from "./core";
import { measureJson, type MeasureJson } from "./measure";

export type Jsonified<T> = T extends Fraction
  ? MeasureJson
  : T extends (infer U)[]
    ? Jsonified<U>[]
    : T extends object
      ? { [K in keyof T]: Jsonified<T[K]> }
      : T;

export function toJson<T>(value: T, opts: { unit: Unit; denominator: number }): Jsonified<T> {
  const walk = (v: unknown): unknown => {
    if (v instanceof Fraction) return measureJson(v, { unit: opts.unit, denominator: opts.denominator, style: "inches" });
    if (Array.isArray(v)) return v.map(walk);
    if (v !== null && typeof v === "object") return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, walk(x)]));
    return v;
  };
  return walk(value) as Jsonified<T>;
}
