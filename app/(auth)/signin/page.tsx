import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/sign-in-form";
import { getCurrentUser } from "@/lib/auth/session";
import { safeCallbackPath } from "@/lib/navigation";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: PageProps<"/signin">) {
  const params = await searchParams;
  const callbackUrl = safeCallbackPath(typeof params.callbackUrl === "string" ? params.callbackUrl : null);
  if (await getCurrentUser()) redirect(callbackUrl);
  return (
    <div className="card space-y-6 p-6 sm:p-8">
      <div className="space-y-1">
        <h1 className="text-2xl">Sign in</h1>
        <p className="text-ink-soft">Use the e-mail your instructor invited, or the one you signed up with.</p>
      </div>
      <SignInForm callbackUrl={callbackUrl} initialError={typeof params.error === "string" ? params.error : undefined} />
    </div>
  );
}
