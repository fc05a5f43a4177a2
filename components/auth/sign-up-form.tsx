"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { signIn } from "next-auth/react";
import { useForm } from "react-hook-form";
import { signUpSchema, type SignUpInput } from "@/lib/accounts/schemas";
import { Alert } from "@/components/ui/alert";
import { TextField } from "@/components/ui/text-field";
import { callApi } from "@/components/ui/call-api";
import { useServerErrors } from "@/components/ui/use-server-form";
import { useHydrated } from "@/components/ui/use-hydrated";

export function SignUpForm({ callbackUrl }: { callbackUrl: string }) {
  const hydrated = useHydrated();
  const {
    register,
    handleSubmit,
    setError,
    setFocus,
    formState: { errors, isSubmitting },
  } = useForm<SignUpInput>({ resolver: zodResolver(signUpSchema), defaultValues: { name: "", email: "", password: "" } });
  const { formError, setFormError, showFailure } = useServerErrors({ setError, setFocus }, ["name", "email", "password"]);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(undefined);
    const created = await callApi("/api/signup", "POST", values);
    if (!created.ok) {
      showFailure(created);
      return;
    }
    const result = await signIn("credentials", { email: values.email, password: values.password, redirect: false });
    if (result?.error) {
      // A full load, like the success path below, so the header starts again.
      // eslint-disable-next-line @next/next/no-location-assign-relative-destination
      window.location.assign("/signin");
      return;
    }
    // A full load, so the header and every cached view start again as the signed-in user.
    window.location.assign(callbackUrl);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError ? <Alert tone="error">{formError}</Alert> : null}
      <fieldset disabled={!hydrated} className="min-w-0 space-y-4">
        <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...register("name")} />
        <TextField label="E-mail" type="email" autoComplete="email" inputMode="email" error={errors.email?.message} {...register("email")} />
        <TextField
          label="Password"
          type="password"
          autoComplete="new-password"
          hint="At least 10 characters. A short phrase is easier to remember than a jumble."
          error={errors.password?.message}
          {...register("password")}
        />
        <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
          {isSubmitting ? "Creating your account…" : "Create account"}
        </button>
      </fieldset>
      <p className="text-sm text-ink-soft">
        Already have an account? <Link href="/signin">Sign in</Link>. Enrolled in a class? Your instructor sends an invitation, or gives
        you a join code to enter after you sign up.
      </p>
    </form>
  );
}
