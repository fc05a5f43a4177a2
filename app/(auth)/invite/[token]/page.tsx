import type { Metadata } from "next";
import Link from "next/link";
import { AcceptAsSignedIn, AcceptWithNewAccount, SignOutAndReturn } from "@/components/classes/accept-invitation";
import { LocalTime } from "@/components/ui/local-time";
import { getCurrentUser } from "@/lib/auth/session";
import { refusalFor, viewInvitation } from "@/lib/classes/accept";

// The token is in the address: never send it on to another site as a referrer.
export const metadata: Metadata = { title: "Class invitation", referrer: "no-referrer", robots: { index: false } };

const REFUSAL_TITLE = {
  unknown: "This link does not work",
  used: "This invitation was already used",
  revoked: "This invitation was cancelled",
  expired: "This invitation has run out",
  closed: "This class is closed",
} as const;

export default async function InvitationPage({ params }: PageProps<"/invite/[token]">) {
  const { token } = await params;
  const [view, user] = await Promise.all([viewInvitation(token), getCurrentUser()]);
  const self = `/invite/${token}`;

  if (view.state !== "open") {
    return (
      <div className="card space-y-4 p-6 sm:p-8">
        <h1 className="text-2xl">{REFUSAL_TITLE[view.state]}</h1>
        {"className" in view ? <p className="font-semibold">{view.className}</p> : null}
        <p className="text-ink-soft">{refusalFor(view.state)}</p>
        <p className="flex flex-wrap gap-3">
          {user ? (
            <Link href="/my-classes" className="btn-quiet">
              Go to My classes
            </Link>
          ) : (
            <Link href={`/signin?callbackUrl=${encodeURIComponent("/my-classes")}`} className="btn-quiet">
              Sign in
            </Link>
          )}
        </p>
      </div>
    );
  }

  return (
    <div className="card space-y-6 p-6 sm:p-8">
      <div className="space-y-1">
        <p className="text-sm font-semibold uppercase tracking-wide text-ink-faint">Class invitation</p>
        <h1 className="text-2xl">{view.className}</h1>
        <p className="text-ink-soft">
          {view.term} · {view.instructorName} invited <span className="break-all font-semibold text-ink">{view.email}</span>.
        </p>
        <p className="text-sm text-ink-soft">
          The link works once, until <LocalTime iso={view.expiresAt} />.
        </p>
      </div>
      {user && user.email === view.email ? (
        <AcceptAsSignedIn token={token} className={view.className} />
      ) : user ? (
        <div className="space-y-3">
          <p>
            You are signed in as <span className="break-all font-semibold">{user.email}</span>, but this invitation is for{" "}
            <span className="break-all font-semibold">{view.email}</span>. Sign out, then open the link again to join with the invited address.
          </p>
          <SignOutAndReturn token={token} />
        </div>
      ) : view.accountExists ? (
        <div className="space-y-3">
          <p>There is already a Sixteenths account for this e-mail. Sign in, and you come straight back here to join.</p>
          <Link href={`/signin?callbackUrl=${encodeURIComponent(self)}`} className="btn-primary w-full">
            Sign in to join
          </Link>
        </div>
      ) : (
        <div className="space-y-3">
          <p>Make your account: choose the name your instructor will see and a password.</p>
          <AcceptWithNewAccount token={token} email={view.email} name={view.name ?? ""} />
        </div>
      )}
    </div>
  );
}
