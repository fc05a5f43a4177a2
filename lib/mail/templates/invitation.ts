import { env } from "@/lib/env";
import { composeMail, type MailMessage } from "@/lib/mail/message";

export type InvitationMail = {
  to: string;
  /** The name the instructor typed, if any; the greeting stays plain without one. */
  name: string | null;
  className: string;
  term: string;
  instructorName: string;
  token: string;
  expiresAt: Date;
};

/** The link goes in the e-mail only; the database keeps a hash of the token. */
export function invitationUrl(token: string): string {
  return `${env().NEXTAUTH_URL.replace(/\/$/, "")}/invite/${token}`;
}

export function invitationMail(invite: InvitationMail): MailMessage {
  const expires = new Intl.DateTimeFormat("en-US", { dateStyle: "full", timeStyle: "short", timeZone: "UTC" }).format(invite.expiresAt);
  return composeMail("invitation", invite.to, `${invite.instructorName} added you to ${invite.className}`, {
    greeting: invite.name ? `Hello ${invite.name},` : "Hello,",
    paragraphs: [
      `${invite.instructorName} has invited you to ${invite.className} (${invite.term}) on Sixteenths, where the class does its layout math: lessons, calculators, practice problems and assignments, all in fractions of an inch.`,
      "Open the link below to join. If you are new to Sixteenths, you choose your name and a password there; if you already have an account with this e-mail, you sign in and join with one click.",
    ],
    action: { label: "Join the class", url: invitationUrl(invite.token) },
    footnote: `The link works once and runs out on ${expires} UTC. If it has run out, ask your instructor to send a new one. If you were not expecting this, you can ignore it.`,
  });
}
