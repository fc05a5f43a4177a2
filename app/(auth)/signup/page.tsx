import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { getCurrentUser } from "@/lib/auth/session";
import { safeCallbackPath } from "@/lib/navigation";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: PageProps<"/signup">) {
  const params = await searchParams;
  const callbackUrl = safeCallbackPath(typeof params.callbackUrl === "string" ? params.callbackUrl : null);
  if (await getCurrentUser()) redirect(callbackUrl);
  return (
    <div className="card space-y-6 p-6 sm:p-8">
      <div className="space-y-1">
        <h1 className="text-2xl">Create an account</h1>
        <p className="text-ink-soft">Free for self-learners: keep your lesson progress and practice scores.</p>
      </div>
      <SignUpForm callbackUrl={callbackUrl} />
    </div>
  );
}
