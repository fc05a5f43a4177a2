"use client";

import { useId } from "react";
import { useWatch, type FieldErrors, type UseFormRegister } from "react-hook-form";
import { TextField } from "@/components/ui/text-field";
import type { BuilderControl, BuilderValues } from "./builder-values";

type Props = { register: UseFormRegister<BuilderValues>; control: BuilderControl; errors: FieldErrors<BuilderValues> };

const POLICIES = [
  { value: "none", label: "No late work", hint: "Closes at the due date." },
  { value: "until", label: "Take late work until a date", hint: "Full credit until then." },
  { value: "penalty", label: "Take late work with a penalty", hint: "A share of the points off for each day, or part of a day, late." },
] as const;

/** Opening, due date and the late-work policy with the one field each policy needs. */
export function BuilderSchedule({ register, control, errors }: Props) {
  const policy = useWatch({ control, name: "latePolicy" });
  const legendId = useId();
  return (
    <section className="space-y-4" aria-labelledby="schedule-heading">
      <h2 id="schedule-heading" className="text-xl">
        Dates and late work
      </h2>
      <p className="text-sm text-ink-soft">Times are in your own time zone; each student sees them in theirs.</p>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Opens" type="datetime-local" error={errors.opensAt?.message} {...register("opensAt")} />
        <TextField label="Due" type="datetime-local" error={errors.dueAt?.message} {...register("dueAt")} />
      </div>
      <fieldset className="space-y-1" aria-labelledby={legendId}>
        <legend id={legendId} className="mb-1 font-semibold">
          Late work
        </legend>
        {POLICIES.map((p) => (
          <label key={p.value} className="flex min-h-touch items-start gap-2 py-1">
            <input type="radio" value={p.value} className="mt-1 size-5 shrink-0 accent-chalk" {...register("latePolicy")} />
            <span>
              {p.label}
              <span className="block text-sm text-ink-soft">{p.hint}</span>
            </span>
          </label>
        ))}
        {errors.latePolicy?.message ? <p className="text-sm font-semibold text-danger">{errors.latePolicy.message}</p> : null}
      </fieldset>
      {policy === "until" ? (
        <TextField label="Last moment late work is taken" type="datetime-local" className="sm:max-w-sm" error={errors.lateUntil?.message} {...register("lateUntil")} />
      ) : null}
      {policy === "penalty" ? (
        <TextField
          label="Penalty per day late (%)"
          type="number"
          inputMode="numeric"
          min={1}
          max={100}
          className="sm:max-w-sm"
          hint="Work closes once the penalty has taken every point."
          error={errors.latePenaltyPercent?.message}
          {...register("latePenaltyPercent")}
        />
      ) : null}
    </section>
  );
}
