import type { Metadata } from "next";
import { ForgotPasswordForm } from "@/components/auth/forgot-password-form";

export const metadata: Metadata = { title: "Forgot your password?" };

export default async function ForgotPasswordPage({ searchParams }: PageProps<"/forgot-password">) {
  const params = await searchParams;
  const initialEmail = typeof params.email === "string" ? params.email.slice(0, 254) : "";
  return (
    <div className="card space-y-6 p-6 sm:p-8">
      <div className="space-y-1">
        <h1 className="text-2xl">Forgot your password?</h1>
        <p className="text-ink-soft">Type the e-mail you sign in with. We will send a link to choose a new password.</p>
      </div>
      <ForgotPasswordForm initialEmail={initialEmail} />
    </div>
  );
}
