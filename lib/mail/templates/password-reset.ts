import { composeMail, type MailMessage } from "../message";
import { appLink } from "../links";

export const RESET_LINK_HOURS = 1;

/** The link to choose a new password; only its holder can use it, once, within the hour. */
export function passwordResetMail({ to, name, token }: { to: string; name: string; token: string }): MailMessage {
  return composeMail("password-reset", to, "Choose a new Sixteenths password", {
    greeting: `Hi ${name},`,
    paragraphs: [
      "Someone (we hope you) asked to reset the password for the Sixteenths account that uses this address.",
      "Follow the link below to choose a new one. Your old password keeps working until you do.",
    ],
    action: { label: "Choose a new password", url: appLink(`/reset-password/${encodeURIComponent(token)}`) },
    footnote: `The link works once and runs out in ${RESET_LINK_HOURS} hour. If you did not ask for it, ignore this e-mail: nothing changes.`,
  });
}
