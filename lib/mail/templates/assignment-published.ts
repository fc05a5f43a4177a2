import { composeMail, type MailMessage } from "@/lib/mail/message";

export type AssignmentPublishedMail = {
  to: string;
  studentName: string;
  className: string;
  title: string;
  dueAt: Date;
  classId: number;
  assignmentId: number;
  /** The app's own address (NEXTAUTH_URL), without a trailing slash. */
  baseUrl: string;
};

/**
 * The due date spelled out in UTC: mail is read anywhere, hours later, so it names its zone
 * plainly instead of guessing the reader's; the page itself shows the reader's local time.
 */
export function dueDateText(dueAt: Date): string {
  const date = new Intl.DateTimeFormat("en-US", { weekday: "long", month: "long", day: "numeric", year: "numeric", timeZone: "UTC" }).format(dueAt);
  const time = new Intl.DateTimeFormat("en-US", { hour: "numeric", minute: "2-digit", timeZone: "UTC" }).format(dueAt);
  return `${date}, ${time} UTC`;
}

export function assignmentPublishedMail(m: AssignmentPublishedMail): MailMessage {
  const firstName = m.studentName.trim().split(/\s+/)[0] || "there";
  return composeMail("assignment-published", m.to, `New assignment in ${m.className}: ${m.title}`, {
    greeting: `Hi ${firstName},`,
    paragraphs: [
      `Your instructor has posted "${m.title}" for ${m.className}.`,
      `It is due ${dueDateText(m.dueAt)}. Every student gets their own numbers, so work your own layout from the problems on your page.`,
    ],
    action: { label: "Open the assignment", url: `${m.baseUrl}/my-classes/${m.classId}/assignments/${m.assignmentId}` },
    footnote: "You get this because you are on the class roster. Sign in with the e-mail address this message was sent to.",
  });
}
