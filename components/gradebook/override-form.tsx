"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Alert } from "@/components/ui/alert";
import { callApi } from "@/components/ui/call-api";
import { focusWhenReady } from "@/components/ui/use-server-form";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { TextField } from "@/components/ui/text-field";
import { formToOverride, overrideFormSchema, type OverrideForm as FormValues } from "@/lib/gradebook/schemas";

type Props = { path: string; studentName: string; possible: number; hasOverride: boolean; onSaved: () => void };

const ACTIONS = [
  { value: "points", label: "Set the points" },
  { value: "excused", label: "Excuse this work (left out of the total)" },
  { value: "clear", label: "Go back to the score the tries give" },
] as const;

/** Change, excuse or restore one score, with a reason the student will read in their e-mail. */
export function OverrideForm({ path, studentName, possible, hasOverride, onSaved }: Props) {
  const form = useForm<FormValues>({ resolver: zodResolver(overrideFormSchema), defaultValues: { action: "points", points: "", reason: "" } });
  const [pending, setPending] = useState<FormValues | null>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | undefined>();
  const [done, setDone] = useState<string | null>(null);
  const action = useWatch({ control: form.control, name: "action" });
  const errors = form.formState.errors;

  const confirm = async () => {
    if (!pending) return;
    setBusy(true);
    setError(undefined);
    const result = await callApi(`${path}/override`, "POST", formToOverride(pending));
    setBusy(false);
    if (!result.ok) {
      // The dialog closes on a field's refusal, so the message lands beside that field with the focus.
      const onForm = Object.entries(result.fields).filter(([field]) => field === "points" || field === "reason") as ["points" | "reason", string][];
      for (const [field, message] of onForm) form.setError(field, { type: "server", message });
      if (onForm.length > 0) focusWhenReady(form.setFocus, onForm[0][0]);
      setError(result.message);
      if (Object.keys(result.fields).length > 0) setPending(null);
      return;
    }
    setPending(null);
    setDone(`Saved. ${studentName} has been e-mailed the change and the reason.`);
    form.reset({ action: "points", points: "", reason: "" });
    onSaved();
  };

  const summary = pending ? (pending.action === "excused" ? "excuse this work" : pending.action === "clear" ? "go back to the computed score" : `set the score to ${pending.points} of ${possible} points`) : "";

  return (
    <form
      noValidate
      className="card space-y-3 p-4"
      aria-labelledby="override-heading"
      onSubmit={form.handleSubmit((values) => {
        if (values.action === "points" && Number(values.points) > possible) {
          form.setError("points", { message: `Give at most ${possible} points.` });
          return;
        }
        setDone(null);
        setError(undefined);
        setPending(values);
      })}
    >
      <h3 id="override-heading" className="text-lg">
        Change this score
      </h3>
      {done ? <Alert tone="success">{done}</Alert> : null}
      <fieldset className="space-y-1">
        <legend className="font-semibold">What to do</legend>
        {ACTIONS.filter((a) => a.value !== "clear" || hasOverride).map((a) => (
          <label key={a.value} className="flex items-center gap-2">
            <input type="radio" value={a.value} {...form.register("action")} />
            {a.label}
          </label>
        ))}
      </fieldset>
      {action === "points" ? <TextField label={`Points (0 to ${possible})`} inputMode="decimal" autoComplete="off" error={errors.points?.message} {...form.register("points")} /> : null}
      <div>
        <label htmlFor="override-reason" className="mb-1 block font-semibold">
          Reason (the student reads this)
        </label>
        <textarea id="override-reason" rows={3} className="input" aria-invalid={errors.reason ? true : undefined} aria-describedby={errors.reason ? "override-reason-error" : undefined} {...form.register("reason")} />
        {errors.reason ? (
          <p id="override-reason-error" className="mt-1 text-sm font-semibold text-danger">
            {errors.reason.message}
          </p>
        ) : null}
      </div>
      <button type="submit" className="btn-primary">
        Review the change
      </button>
      <ConfirmDialog open={pending !== null} title="Change the score?" confirmLabel="Change and e-mail" busy={busy} busyLabel="Saving…" error={error} onConfirm={confirm} onCancel={() => setPending(null)}>
        <p>
          You are about to {summary} for {studentName}. The change is kept in the history, and {studentName} gets an e-mail with your reason:
        </p>
        <p className="mt-2 italic">“{pending?.reason}”</p>
      </ConfirmDialog>
    </form>
  );
}
