// The builder's form state and its trip to the shared schema. Dates are edited as the browser's
// local date and time (datetime-local) and travel as ISO instants; that conversion happens here,
// just before the one schema (lib/assignments/schemas.ts) validates, so the form and the API agree.
import { fromLocalInput, toLocalInput } from "@/components/ui/local-time";
import type { Control } from "react-hook-form";
import type { AssignmentData, AssignmentInput } from "@/lib/assignments/schemas";
import type { TeacherAssignment } from "@/lib/assignments/teacher-views";

export type ItemValues = { kind: string; level: number | string; problemCount: number | string; tolerance: "half" | "full"; points: number | string };

export type BuilderValues = {
  title: string;
  instructions: string;
  opensAt: string;
  dueAt: string;
  latePolicy: "none" | "until" | "penalty";
  lateUntil: string;
  latePenaltyPercent: number | string;
  attemptsAllowed: number | string;
  reveal: "when-final" | "after-due";
  items: ItemValues[];
};

/** The form's control: edited as BuilderValues, submitted as the schema's output. */
export type BuilderControl = Control<BuilderValues, unknown, AssignmentData>;

export const NEW_ITEM: ItemValues = { kind: "even-gap", level: 1, problemCount: 3, tolerance: "half", points: 5 };

export function toPayload(v: BuilderValues): AssignmentInput {
  return {
    title: v.title,
    instructions: v.instructions,
    opensAt: fromLocalInput(v.opensAt),
    dueAt: fromLocalInput(v.dueAt),
    latePolicy: v.latePolicy,
    lateUntil: v.latePolicy === "until" ? fromLocalInput(v.lateUntil) || null : null,
    latePenaltyPercent: v.latePolicy === "penalty" ? (v.latePenaltyPercent === "" ? null : Number(v.latePenaltyPercent)) : null,
    attemptsAllowed: v.attemptsAllowed as number,
    reveal: v.reveal,
    items: v.items.map((i) => ({ kind: i.kind, level: i.level as number, problemCount: i.problemCount as number, tolerance: i.tolerance, points: i.points as number })),
  };
}

/** The form's first values: an existing assignment's, or a fresh week-long assignment opening now. */
export function initialValues(existing: TeacherAssignment | null, now = new Date()): BuilderValues {
  if (existing) {
    return {
      title: existing.title,
      instructions: existing.instructions,
      opensAt: toLocalInput(existing.opensAt),
      dueAt: toLocalInput(existing.dueAt),
      latePolicy: existing.latePolicy,
      lateUntil: existing.lateUntil ? toLocalInput(existing.lateUntil) : "",
      latePenaltyPercent: existing.latePenaltyPercent ?? 10,
      attemptsAllowed: existing.attemptsAllowed,
      reveal: existing.reveal,
      items: existing.items.map((i) => ({ kind: i.kind, level: i.level, problemCount: i.problemCount, tolerance: i.tolerance, points: i.points })),
    };
  }
  const opens = new Date(now);
  opens.setMinutes(0, 0, 0);
  const due = new Date(opens);
  due.setDate(due.getDate() + 7);
  due.setHours(23, 59, 0, 0);
  const lateUntil = new Date(due);
  lateUntil.setDate(lateUntil.getDate() + 3);
  return {
    title: "",
    instructions: "",
    opensAt: toLocalInput(opens.toISOString()),
    dueAt: toLocalInput(due.toISOString()),
    latePolicy: "penalty",
    lateUntil: toLocalInput(lateUntil.toISOString()),
    latePenaltyPercent: 10,
    attemptsAllowed: 3,
    reveal: "when-final",
    items: [{ ...NEW_ITEM }],
  };
}

export function totalPoints(items: ItemValues[]): number {
  return items.reduce((sum, i) => {
    const n = Number(i.problemCount) * Number(i.points);
    return sum + (Number.isFinite(n) && n > 0 ? n : 0);
  }, 0);
}
