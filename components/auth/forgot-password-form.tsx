"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { resetRequestSchema, type ResetRequestInput } from "@/lib/accounts/password-reset-schemas";
import { callApi } from "@/components/ui/call-api";
import { useServerErrors } from "@/components/ui/use-server-form";
import { Alert } from "@/components/ui/alert";
import { TextField } from "@/components/ui/text-field";
import { useHydrated } from "@/components/ui/use-hydrated";

export function ForgotPasswordForm({ initialEmail }: { initialEmail: string }) {
  const [sent, setSent] = useState<string>();
  const hydrated = useHydrated();
  const {
    register,
    handleSubmit,
    setError,
    setFocus,
    getValues,
    formState: { errors, isSubmitting },
  } = useForm<ResetRequestInput>({ resolver: zodResolver(resetRequestSchema), defaultValues: { email: initialEmail } });
  const { formError, setFormError, showFailure } = useServerErrors({ setError, setFocus }, ["email"]);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(undefined);
    const result = await callApi<{ message?: string }>("/api/password-reset", "POST", values);
    if (!result.ok) {
      showFailure(result);
      return;
    }
    setSent(result.data.message ?? "If an account uses that address, a link is on its way.");
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
