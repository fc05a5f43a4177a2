"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { signInSchema } from "@/lib/accounts/schemas";
import { Alert } from "@/components/ui/alert";
import { TextField } from "@/components/ui/text-field";
import { useHydrated } from "@/components/ui/use-hydrated";

type Values = z.input<typeof signInSchema>;

const WRONG_CREDENTIALS = "That e-mail and password do not match an account. Check both and try again.";

export function SignInForm({ callbackUrl, initialError }: { callbackUrl: string; initialError?: string }) {
  const [formError, setFormError] = useState<string | undefined>(initialError ? describe(initialError) : undefined);
  const hydrated = useHydrated();
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<Values>({ resolver: zodResolver(signInSchema), defaultValues: { email: "", password: "" } });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(undefined);
    const result = await signIn("credentials", { ...values, redirect: false, callbackUrl });
    if (!result || result.error) {
      setFormError(describe(result?.error ?? "network"));
      return;
    }
    // A full load, so the header and every cached view start again as the signed-in user.
    window.location.assign(callbackUrl);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-describedby={formError ? "signin-error" : undefined}>
      {formError ? (
        <div id="signin-error">
          <Alert tone="error">{formError}</Alert>
        </div>
      ) : null}
      <fieldset disabled={!hydrated} className="min-w-0 space-y-4">
        <TextField label="E-mail" type="email" autoComplete="email" inputMode="email" error={errors.email?.message} {...register("email")} />
        <TextField label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...register("password")} />
        <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
          {isSubmitting ? "Signing in…" : "Sign in"}
        </button>
      </fieldset>
      <p className="text-sm text-ink-soft">
        New here? <Link href={`/signup?callbackUrl=${encodeURIComponent(callbackUrl)}`}>Create an account</Link>.
      </p>
    </form>
  );
}

function describe(code: string): string {
  if (code === "CredentialsSignin") return WRONG_CREDENTIALS;
  if (code === "network") return "Could not reach Sixteenths. Check your connection and try again.";
  if (code === "SessionRequired") return "Sign in to continue.";
  // Our own messages (such as the rate limit's) arrive as readable sentences.
  return /\s/.test(code) ? code : "Sign-in failed. Try again.";
}
