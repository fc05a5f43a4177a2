import type { Metadata } from "next";
import Link from "next/link";
import { connection } from "next/server";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { inspectResetLink, type ResetLinkState } from "@/lib/accounts/password-reset";

export const metadata: Metadata = {
  title: "Choose a new password",
  // The address holds a secret: keep it out of other sites' logs and out of search engines.
  referrer: "no-referrer",
  robots: { index: false, follow: false },
};

const SPENT: Record<Exclude<ResetLinkState, "open">, { heading: string; body: string }> = {
  unknown: {
    heading: "We do not recognise this link",
    body: "It is not one we sent, or part of it went missing when it was copied. Open it straight from the e-mail, or ask for a new one.",
  },
  used: {
    heading: "This link has already been used",
    body: "Each reset link works once. If the password was changed by you, sign in with it. If not, ask for a new link.",
  },
  expired: {
    heading: "This link has run out",
    body: "Reset links last one hour, so that an old e-mail cannot be used to take over the account. Ask for a new one; it only takes a minute.",
  },
};

export default async function ResetPasswordPage({ params }: PageProps<"/reset-password/[token]">) {
  // Read fresh on every visit: a link's state changes when it is used or runs out.
  await connection();
  const { token } = await params;
  const link = await inspectResetLink(token);

  if (link.state !== "open") {
    const spent = SPENT[link.state];
    const askAgain = link.email ? `/forgot-password?email=${encodeURIComponent(link.email)}` : "/forgot-password";
    return (
      <div className="card space-y-6 p-6 sm:p-8">
        <div className="space-y-2">
          <h1 className="text-2xl">{spent.heading}</h1>
          <p className="text-ink-soft">{spent.body}</p>
        </div>
        <div className="flex flex-col gap-3 sm:flex-row">
          <Link href={askAgain} className="btn-primary">
            Ask for a new link
          </Link>
          <Link href="/signin" className="btn-quiet">
            Back to sign in
          </Link>
        </div>
      </div>
    );
  }

  return (
    <div className="card space-y-6 p-6 sm:p-8">
      <div className="space-y-1">
        <h1 className="text-2xl">Choose a new password</h1>
        <p className="text-ink-soft">
          For the account <span className="break-all font-semibold text-ink">{link.email}</span>. Every other reset link for it stops working
          once you save.
        </p>
      </div>
      <ResetPasswordForm token={token} email={link.email ?? ""} />
    </div>
  );
}
