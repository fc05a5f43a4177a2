"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { useForm } from "react-hook-form";
import type { InviteOutcome } from "@/lib/classes/invitations";
import { inviteSchema, MAX_INVITES_AT_ONCE, type InviteInput } from "@/lib/classes/schemas";
import { Alert } from "@/components/ui/alert";
import { useHydrated } from "@/components/ui/use-hydrated";
import { callApi } from "@/components/ui/call-api";
import { SendProgress } from "./send-progress";

const OUTCOME_STYLE = { sent: "text-ok", resent: "text-chalk-dark", refused: "text-danger" } as const;
const OUTCOME_WORD = { sent: "Invited", resent: "Re-sent", refused: "Not sent" } as const;

export function InviteForm({ classId }: { classId: number }) {
  const router = useRouter();
  const hydrated = useHydrated();
  const id = useId();
  const [formError, setFormError] = useState<string>();
  const [sent, setSent] = useState<{ batch: string; results: InviteOutcome[] }>();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<InviteInput>({ resolver: zodResolver(inviteSchema), defaultValues: { addresses: "" } });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(undefined);
    const result = await callApi<{ batch: string; results: InviteOutcome[] }>(`/api/classes/${classId}/invitations`, "POST", values);
    if (!result.ok) {
      if (result.fields.addresses) setError("addresses", { message: result.fields.addresses }, { shouldFocus: true });
      else setFormError(result.message);
      return;
    }
    setSent(result.data);
    reset();
    router.refresh();
  });

  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const anySent = sent?.results.some((r) => r.outcome !== "refused");
  return (
    <div className="space-y-4">
      <form onSubmit={onSubmit} noValidate className="space-y-3">
        {formError ? <Alert tone="error">{formError}</Alert> : null}
        <fieldset disabled={!hydrated} className="min-w-0 space-y-3">
          <div>
            <label htmlFor={`${id}-addresses`} className="mb-1 block font-semibold">
              E-mail addresses
            </label>
            <p id={hintId} className="mb-1 text-sm text-ink-soft">
              One per line, or separated by commas. <span className="measure">Name &lt;address&gt;</span> works too. Up to {MAX_INVITES_AT_ONCE} at once.
            </p>
            <textarea
              id={`${id}-addresses`}
              rows={5}
              className="input min-h-32 py-2"
              placeholder={"avery.castellanos@example.com\nBashir Rahimi <bashir.rahimi@example.com>"}
              aria-invalid={errors.addresses ? true : undefined}
              aria-describedby={[hintId, errors.addresses ? errorId : null].filter(Boolean).join(" ")}
              {...register("addresses")}
            />
            {errors.addresses ? (
              <p id={errorId} className="mt-1 text-sm font-semibold text-danger">
                {errors.addresses.message}
              </p>
            ) : null}
          </div>
          <button type="submit" className="btn-primary" disabled={isSubmitting}>
            {isSubmitting ? "Sending…" : "Send invitations"}
          </button>
        </fieldset>
      </form>
      {sent ? (
        <div className="space-y-3 rounded border border-rule bg-paper p-4">
          <ul className="space-y-1 text-sm">
            {sent.results.map((r) => (
              <li key={r.email} className="flex flex-wrap gap-x-2">
                <span className={`font-semibold ${OUTCOME_STYLE[r.outcome]}`}>{OUTCOME_WORD[r.outcome]}:</span>
                <span className="break-all">{r.name ? `${r.name} <${r.email}>` : r.email}</span>
                <span className="text-ink-soft">— {r.message}</span>
              </li>
            ))}
          </ul>
          {anySent ? <SendProgress classId={classId} batch={sent.batch} /> : null}
        </div>
      ) : null}
    </div>
  );
}
