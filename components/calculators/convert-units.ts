import type { Unit } from "@/lib/layout/core";
import { formatMeasure, parseMeasure } from "@/lib/layout/measure";

/**
 * Rewrites length fields when the unit changes, so 96 (inches) becomes 2438 mm rather than
 * silently meaning 96 mm. Text that does not parse is left as typed.
 */
export function convertLengths<V extends Record<string, unknown>>(values: V, fields: (keyof V)[], from: Unit, to: Unit): Partial<V> {
  if (from === to) return {};
  const changed: Partial<V> = {};
  for (const field of fields) {
    const raw = values[field];
    if (typeof raw !== "string" || raw.trim() === "") continue;
    const parsed = parseMeasure(raw, from);
    if (!parsed.ok) continue;
    const text =
      to === "mm"
        ? formatMeasure(parsed.value, { unit: "mm", mmDecimals: 1 }).text.replace(/\.0 mm$/, " mm")
        : formatMeasure(parsed.value, { unit: "in", denominator: 64, style: "inches" }).text;
    changed[field] = text as V[keyof V];
  }
  return changed;
}
