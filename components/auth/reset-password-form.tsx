"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { resetFormSchema, type ResetFormInput } from "@/lib/accounts/password-reset-schemas";
import { callApi } from "@/components/ui/call-api";
import { useServerErrors } from "@/components/ui/use-server-form";
import { Alert } from "@/components/ui/alert";
import { TextField } from "@/components/ui/text-field";
import { useHydrated } from "@/components/ui/use-hydrated";

type Outcome = { done: true; email: string } | { done: false; linkSpent: string };

export function ResetPasswordForm({ token, email }: { token: string; email: string }) {
  const [outcome, setOutcome] = useState<Outcome>();
  const hydrated = useHydrated();
  const {
    register,
    handleSubmit,
    setError,
    setFocus,
    formState: { errors, isSubmitting },
  } = useForm<ResetFormInput>({ resolver: zodResolver(resetFormSchema), defaultValues: { password: "", confirm: "" } });
  const { formError, setFormError, showFailure } = useServerErrors({ setError, setFocus }, ["password"]);

  const onSubmit = handleSubmit(async ({ password }) => {
    setFormError(undefined);
    const result = await callApi<{ email?: string }>("/api/password-reset/confirm", "POST", { token, password });
    if (result.ok) {
      setOutcome({ done: true, email: result.data.email ?? email });
      return;
    }
    // The link itself is not a field to correct: a spent link replaces the form.
    if (result.fields.token && !result.fields.password) setOutcome({ done: false, linkSpent: result.fields.token });
    else showFailure(result);
  });

  if (outcome?.done) {
    return (
      <div className="space-y-4">
        <Alert tone="success">Your password is changed. Sign in with the new one.</Alert>
        <Link href={`/signin?email=${encodeURIComponent(outcome.email)}`} className="btn-primary w-full">
          Sign in
        </Link>
      </div>
    );
  }
  if (outcome) {
    return (
      <div className="space-y-4">
        <Alert tone="error">{outcome.linkSpent}</Alert>
        <Link href={`/forgot-password?email=${encodeURIComponent(email)}`} className="btn-primary w-full">
          Ask for a new link
        </Link>
      </div>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError ? <Alert tone="error">{formError}</Alert> : null}
      {/* Lets a password manager file the new password under the right account. */}
      <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
      <fieldset disabled={!hydrated} className="min-w-0 space-y-4">
        <TextField
          label="New password"
          type="password"
          autoComplete="new-password"
          hint="At least 10 characters. A short phrase is easier to remember than a jumble."
          error={errors.password?.message}
          {...register("password")}
        />
        <TextField label="Type it again" type="password" autoComplete="new-password" error={errors.confirm?.message} {...register("confirm")} />
        <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
          {isSubmitting ? "Saving…" : "Save the new password"}
        </button>
      </fieldset>
    </form>
  );
}
