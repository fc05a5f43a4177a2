import { composeMail, type MailMessage } from "@/lib/mail/message";

export type ScoreChangedMail = {
  to: string;
  studentName: string;
  className: string;
  title: string;
  possible: number;
  /** null = excused. */
  fromPoints: number | null;
  toPoints: number | null;
  excused: boolean;
  reason: string;
  /** The student's assignment page, absolute (appLink). */
  url: string;
};

const scoreText = (points: number | null, possible: number) => (points === null ? "excused" : `${points} of ${possible} points`);

export function scoreChangedMail(m: ScoreChangedMail): MailMessage {
  const firstName = m.studentName.trim().split(/\s+/)[0] || "there";
  const change = m.excused
    ? `Your instructor has excused you from "${m.title}" in ${m.className}: it no longer counts toward your total.`
    : `Your instructor changed your score on "${m.title}" in ${m.className} from ${scoreText(m.fromPoints, m.possible)} to ${scoreText(m.toPoints, m.possible)}.`;
  return composeMail("score-changed", m.to, `Score changed by your instructor: ${m.title}`, {
    greeting: `Hi ${firstName},`,
    paragraphs: [change, `Reason given: ${m.reason}`],
    action: { label: "See the assignment", url: m.url },
    footnote: "Questions about it? Ask your instructor in the shop or by reply to their usual address.",
  });
}
