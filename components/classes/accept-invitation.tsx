"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { signIn, signOut } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { acceptNewAccountSchema, type AcceptNewAccountInput } from "@/lib/classes/schemas";
import { Alert } from "@/components/ui/alert";
import { TextField } from "@/components/ui/text-field";
import { useHydrated } from "@/components/ui/use-hydrated";
import { callApi } from "@/components/ui/call-api";
import { useServerErrors } from "@/components/ui/use-server-form";

/** For a visitor without an account: name and password make a student account, then sign in. */
export function AcceptWithNewAccount({ token, email, name }: { token: string; email: string; name: string }) {
  const hydrated = useHydrated();
  const {
    register,
    handleSubmit,
    setError,
    setFocus,
    formState: { errors, isSubmitting },
  } = useForm<AcceptNewAccountInput>({ resolver: zodResolver(acceptNewAccountSchema), defaultValues: { name, password: "" } });
  const { formError, setFormError, showFailure } = useServerErrors({ setError, setFocus }, ["name", "password"]);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(undefined);
    const result = await callApi(`/api/invitations/${token}/accept`, "POST", values);
    if (!result.ok) {
      showFailure(result);
      return;
    }
    const signedIn = await signIn("credentials", { email, password: values.password, redirect: false });
    // A full load, so the header and every cached view start again as the signed-in student.
    window.location.assign(signedIn?.error ? "/signin?callbackUrl=%2Fmy-classes" : "/my-classes");
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError ? <Alert tone="error">{formError}</Alert> : null}
      <fieldset disabled={!hydrated} className="min-w-0 space-y-4">
        <div>
          <p className="mb-1 font-semibold">E-mail</p>
          <p className="rounded border border-rule bg-paper-sunk px-3 py-2 break-all">{email}</p>
        </div>
        <TextField label="Your name" autoComplete="name" hint="As your instructor should see it on the roster." error={errors.name?.message} {...register("name")} />
        <TextField
          label="Password"
          type="password"
          autoComplete="new-password"
          hint="At least 10 characters. A short phrase is easier to remember than a jumble."
          error={errors.password?.message}
          {...register("password")}
        />
        <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
          {isSubmitting ? "Joining…" : "Create account and join"}
        </button>
      </fieldset>
    </form>
  );
}

/** For the signed-in student the invitation was sent to. */
export function AcceptAsSignedIn({ token, className }: { token: string; className: string }) {
  const router = useRouter();
  const hydrated = useHydrated();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string>();
  const join = async () => {
    setPending(true);
    setError(undefined);
    const result = await callApi(`/api/invitations/${token}/accept`, "POST", {});
    if (!result.ok) {
      setError(result.message);
      setPending(false);
      return;
    }
    router.push("/my-classes");
  };
  return (
    <div className="space-y-3">
      {error ? <Alert tone="error">{error}</Alert> : null}
      <button type="button" className="btn-primary w-full" disabled={!hydrated || pending} onClick={join}>
        {pending ? "Joining…" : `Join ${className}`}
      </button>
    </div>
  );
}

export function SignOutAndReturn({ token }: { token: string }) {
  return (
    <button type="button" className="btn-primary w-full" onClick={() => signOut({ callbackUrl: `/invite/${token}` })}>
      Sign out and open the invitation again
    </button>
  );
}
