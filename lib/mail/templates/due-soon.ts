import { composeMail, type MailMessage } from "../message";
import { appLink, utcWritten } from "../links";

export type DueSoon = { to: string; name: string; assignmentId: number; assignmentTitle: string; classId: number; className: string; dueAt: Date };

/** "Due within 24 hours", sent once per student and assignment by `npm run reminders`. */
export function dueSoonMail(d: DueSoon): MailMessage {
  return composeMail("due-soon", d.to, `Due within 24 hours: ${d.assignmentTitle}`, {
    greeting: `Hi ${d.name},`,
    paragraphs: [
      `“${d.assignmentTitle}” for ${d.className} is due ${utcWritten(d.dueAt)}, and you still have problems to finish.`,
      "Work through the rest before then. The assignment page shows the due time in your own time zone and how many tries you have left on each problem.",
    ],
    action: { label: "Open the assignment", url: appLink(`/my-classes/${d.classId}/assignments/${d.assignmentId}`) },
    footnote: "You get this reminder once per assignment. The assignment page always shows your current due date, including any extra time your instructor gives you.",
  });
}
