"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { resetRequestSchema, type ResetRequestInput } from "@/lib/accounts/password-reset-schemas";
import type { ErrorBody } from "@/lib/errors";
import { Alert } from "@/components/ui/alert";
import { TextField } from "@/components/ui/text-field";
import { useHydrated } from "@/components/ui/use-hydrated";

export function ForgotPasswordForm({ initialEmail }: { initialEmail: string }) {
  const [formError, setFormError] = useState<string>();
  const [sent, setSent] = useState<string>();
  const hydrated = useHydrated();
  const {
    register,
    handleSubmit,
    setError,
    getValues,
    formState: { errors, isSubmitting },
  } = useForm<ResetRequestInput>({ resolver: zodResolver(resetRequestSchema), defaultValues: { email: initialEmail } });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(undefined);
    let response: Response;
    try {
      response = await fetch("/api/password-reset", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(values) });
    } catch {
      setFormError("Could not reach Sixteenths. Check your connection and try again.");
      return;
    }
    const body = (await response.json().catch(() => null)) as ({ message?: string } & Partial<ErrorBody>) | null;
    if (!response.ok) {
      if (body?.error?.fields?.email) setError("email", { message: body.error.fields.email });
      else setFormError(body?.error?.message ?? "Asking for a link failed. Try again in a moment.");
      return;
    }
    setSent(body?.message ?? "If an account uses that address, a link is on its way.");
  });

  if (sent) {
    return (
      <div className="space-y-4">
        <Alert tone="success">{sent}</Alert>
        <p className="text-ink-soft">
          You typed <span className="break-all font-semibold text-ink">{getValues("email")}</span>. The link works once, for one hour. Nothing
          there after a few minutes? Check the spam folder, then ask again.
        </p>
        <div className="flex flex-col gap-3 sm:flex-row">
          <Link href="/signin" className="btn-primary">
            Back to sign in
          </Link>
          <button type="button" className="btn-quiet" onClick={() => setSent(undefined)}>
            Use another address
          </button>
        </div>
      </div>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError ? <Alert tone="error">{formError}</Alert> : null}
      <fieldset disabled={!hydrated} className="min-w-0 space-y-4">
        <TextField label="E-mail" type="email" autoComplete="email" inputMode="email" error={errors.email?.message} {...register("email")} />
        <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
          {isSubmitting ? "Sending…" : "Send me a link"}
        </button>
      </fieldset>
      <p className="text-sm text-ink-soft">
        Remembered it? <Link href="/signin">Sign in</Link>. No account yet? <Link href="/signup">Create one</Link>.
      </p>
    </form>
  );
}
