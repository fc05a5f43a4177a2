"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useSearchParams } from "next/navigation";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
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
  // Filled in after a password reset, which knows the account's address.
  const initialEmail = useSearchParams().get("email")?.slice(0, 254) ?? "";
  const {
    register,
    handleSubmit,
    control,
    formState: { errors, isSubmitting },
  } = useForm<Values>({ resolver: zodResolver(signInSchema), defaultValues: { email: initialEmail, password: "" } });
  const typedEmail = (useWatch({ control, name: "email" }) ?? "").trim();

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
        <div className="space-y-1">
          <TextField label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...register("password")} />
          <p className="text-right text-sm">
            <Link href={typedEmail ? `/forgot-password?email=${encodeURIComponent(typedEmail)}` : "/forgot-password"}>Forgot your password?</Link>
          </p>
        </div>
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
