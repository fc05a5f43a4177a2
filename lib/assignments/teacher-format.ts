// Words for the builder's settings. Pure, so the form, the pages and the server say the same thing.
import type { ProblemPart } from "@/lib/problems/types";

export const TOLERANCE_LABELS = {
  half: "Standard: ± half a graduation",
  full: "Lenient: ± a full graduation",
} as const;

export const REVEAL_LABELS = {
  "when-final": "As soon as each problem is finished",
  "after-due": "Only after the due date",
} as const;

/** How close an answer to this part must be under the item's tolerance. Counts are always exact. */
export function toleranceText(part: Pick<ProblemPart, "answer" | "precision">, tolerance: "half" | "full"): string {
  if (part.answer === "count") return "exact count";
  const unit = part.answer === "length" ? '"' : "";
  return tolerance === "half" ? `within ±1/${part.precision * 2}${unit}` : `within ±1/${part.precision}${unit}`;
}

export type LateRulesText = { latePolicy: "none" | "until" | "penalty"; lateUntilText: string | null; latePenaltyPercent: number | null };

export function latePolicyText(rules: LateRulesText): string {
  if (rules.latePolicy === "until") return `Late work taken until ${rules.lateUntilText ?? "a set date"}, full credit`;
  if (rules.latePolicy === "penalty") {
    const pct = rules.latePenaltyPercent ?? 0;
    return `Late work loses ${pct}% of its points per day late (closes after ${Math.ceil(100 / Math.max(pct, 1))} days)`;
  }
  return "No late work: closes at the due date";
}

export function pluralize(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}

/** A duplicate's title, kept within the 160 characters a title may have. */
export function copyTitle(title: string): string {
  const suffix = " (copy)";
  return title.length + suffix.length <= 160 ? `${title}${suffix}` : `${title.slice(0, 160 - suffix.length).trimEnd()}${suffix}`;
}

/** A problem kind as the builder offers it (the server hands the list over; no generator reaches the browser). */
export type KindOption = {
  key: string;
  title: string;
  summary: string;
  skillTitle: string;
  levels: { level: 1 | 2 | 3; label: string; description: string }[];
};
