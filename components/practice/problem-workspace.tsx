"use client";

import Link from "next/link";
import { useEffect, useRef, useState } from "react";
import type { AssignmentProblemExtras } from "@/lib/assignments/work";
import type { ErrorBody } from "@/lib/errors";
import type { ProblemUpdate, ProblemView } from "@/lib/practice/view";
import { Alert } from "@/components/ui/alert";
import { LocalTime } from "@/components/ui/local-time";
import { useHydrated } from "@/components/ui/use-hydrated";
import { focusFirstInvalid } from "@/components/ui/use-server-form";
import { AnswerField } from "./answer-field";
import { PreviousTries } from "./previous-tries";
import { ProblemFigureView } from "./problem-figure";
import { newSubmissionKey, sendAnswers, type SendingState } from "./send-answers";

type Shown = ProblemView & Partial<AssignmentProblemExtras>;

/** An assignment's problem: answers go to its own route, and the page hears of each try. */
export type AssignmentMode = { answerUrl: string; onAnswered: (reply: { late: boolean }) => void };

type Props = {
  initial: Shown;
  signedIn: boolean;
  headingLevel?: "h1" | "h2" | "h3";
} & ({ assignment?: undefined; /** Called for "Another problem"; the standalone page navigates, a lesson swaps in place. */ onAnother: (problem: ProblemView) => void } | { assignment: AssignmentMode; onAnother?: undefined });

/** The schema names a refused answer `answers.<part>`, the grader names it `<part>`; each box shows either. */
function partErrors(fields: Record<string, string> | undefined): Record<string, string> {
  return Object.fromEntries(Object.entries(fields ?? {}).map(([key, message]) => [key.replace(/^answers\./, ""), message]));
}

async function postJson<T>(url: string, body: unknown): Promise<{ ok: true; problem: T; late?: boolean } | { ok: false; error: ErrorBody["error"] }> {
  try {
    const res = await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
    const json = await res.json();
    return res.ok ? { ok: true, problem: json.problem, late: json.late } : { ok: false, error: json.error };
  } catch {
    return { ok: false, error: { code: "unavailable", message: "Could not reach Sixteenths. Check your connection; your answers are still in the boxes." } };
  }
}

/**
 * One problem: the prompt, an answer box per part, feedback per part, and the worked solution once
 * final. Practice and assignments share it; an assignment adds its tries, points and dates.
 */
export function ProblemWorkspace({ initial, onAnother, assignment, signedIn, headingLevel = "h1" }: Props) {
  const hydrated = useHydrated();
  const [problem, setProblem] = useState(initial);
  const [answers, setAnswers] = useState<Record<string, string>>(() => Object.fromEntries(initial.parts.map((p) => [p.key, initial.results[p.key]?.raw ?? ""])));
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string>();
  const [busy, setBusy] = useState(false);
  const [lateNote, setLateNote] = useState(false);
  const [sending, setSending] = useState<SendingState | null>(null);
  // The submission whose reply has not come back yet: sending the same answers again reuses its
  // key and body, so if the first send was stored after all the server returns that reply instead
  // of counting a second try.
  const unanswered = useRef<{ signature: string; key: string; body: { answers: Record<string, string>; timeMs: number } } | null>(null);
  const started = useRef(0);
  const solutionRef = useRef<HTMLHeadingElement>(null);
  const answersForm = useRef<HTMLFormElement>(null);
  const focusSolution = useRef(false);
  // An assignment problem also stops taking answers when the student's window closes.
  const final = assignment ? problem.accepting === false : problem.status !== "open";
  const Heading = headingLevel;
  const SubHeading = headingLevel === "h1" ? "h2" : headingLevel === "h2" ? "h3" : "h4";

  // After the render that shows the worked solution, not on a timer that can run before it.
  useEffect(() => {
    if (!focusSolution.current) return;
    focusSolution.current = false;
    solutionRef.current?.focus();
  }, [problem]);

  useEffect(() => {
    started.current = Date.now();
  }, [problem.id, problem.attemptsUsed]);

  const submit = async (event: React.FormEvent) => {
    event.preventDefault();
    if (busy || final) return;
    setBusy(true);
    setFormError(undefined);
    const open = problem.parts.filter((p) => problem.results[p.key]?.verdict !== "correct");
    const chosen = Object.fromEntries(open.map((p) => [p.key, answers[p.key] ?? ""]));
    const signature = JSON.stringify([problem.id, problem.attemptsUsed, chosen]);
    if (unanswered.current?.signature !== signature) {
      unanswered.current = { signature, key: newSubmissionKey(), body: { answers: chosen, timeMs: Math.min(Date.now() - started.current, 86_400_000) } };
    }
    const { key, body } = unanswered.current;
    const result = await sendAnswers<ProblemUpdate & Partial<AssignmentProblemExtras>>(assignment?.answerUrl ?? `/api/practice/${problem.id}/answers`, body, key, setSending);
    setSending(null);
    setBusy(false);
    if (!result.ok) {
      // A refusal stored nothing, so the next send is a new submission; a lost reply keeps its key.
      if (!result.retryable) unanswered.current = null;
      setFieldErrors(partErrors(result.error.fields));
      setFormError(result.error.message);
      focusFirstInvalid(() => answersForm.current);
      return;
    }
    unanswered.current = null;
    setFieldErrors({});
    setProblem((current) => ({ ...current, ...result.problem }));
    setLateNote(result.late === true);
    assignment?.onAnswered({ late: result.late === true });
    focusSolution.current = Boolean(result.problem.final);
  };

  const another = async () => {
    setBusy(true);
    const result = await postJson<ProblemView>("/api/practice", { kind: problem.kind, level: problem.level });
    setBusy(false);
    if (!result.ok) return setFormError(result.error.message);
    setProblem(result.problem);
    setAnswers(Object.fromEntries(result.problem.parts.map((p) => [p.key, ""])));
    setFieldErrors({});
    onAnother?.(result.problem);
  };

  const triesLeft = problem.attemptsAllowed - problem.attemptsUsed;
  return (
    <article className="space-y-5" data-problem={problem.kind} data-status={problem.status} aria-labelledby={`problem-${problem.id}`}>
      <header className="space-y-1">
        <p className="text-sm text-ink-faint">
          {problem.number ? `Problem ${problem.number} · ` : ""}
          {problem.skillTitle} · Level {problem.level}: {problem.levelLabel}
        </p>
        <Heading id={`problem-${problem.id}`} className={headingLevel === "h1" ? "text-2xl" : "text-xl"}>
          {problem.title}
        </Heading>
        {problem.points !== undefined ? (
          <p className="text-sm text-ink-soft" data-points>
            <span className="measure font-semibold text-ink">{problem.earned}</span> of {problem.points} {problem.points === 1 ? "point" : "points"}
          </p>
        ) : null}
      </header>
      <div className="card space-y-3 p-4">
        <div className="space-y-3 leading-relaxed" dangerouslySetInnerHTML={{ __html: problem.promptHtml }} />
        {problem.figure ? <ProblemFigureView figure={problem.figure} /> : null}
      </div>

      <form ref={answersForm} onSubmit={submit} noValidate className="space-y-4" aria-label="Your answers">
        {/* The boxes take typing before the page hydrates (each adopts what was typed); only the
            button waits, so Enter cannot send the answers as a plain form in the address bar. */}
        <fieldset disabled={busy} className="min-w-0 space-y-4">
          <legend className="sr-only">Your answers</legend>
          {problem.parts.map((part) => (
            <AnswerField
              key={`${problem.id}-${part.key}`}
              part={part}
              value={answers[part.key] ?? ""}
              onChange={(v) => setAnswers((a) => ({ ...a, [part.key]: v }))}
              result={problem.results[part.key]}
              error={fieldErrors[part.key]}
              locked={final || problem.results[part.key]?.verdict === "correct"}
            />
          ))}
          {formError ? <Alert tone="error">{formError}</Alert> : null}
          {lateNote ? <Alert tone="info">This try came in after the due date and counts as late.</Alert> : null}
          {final ? null : (
            <div className="flex flex-wrap items-center gap-3">
              <button type="submit" className="btn-primary" disabled={!hydrated}>
                {busy ? "Saving…" : "Check answers"}
              </button>
              <p className="text-sm text-ink-soft" aria-live="polite" data-sending={sending?.phase}>
                {sending?.phase === "retrying" ? (
                  <strong className="text-caution">Could not reach the server, trying again ({sending.attempt} of 2)… Your answers are kept and will count once.</strong>
                ) : sending ? (
                  "Saving your answers…"
                ) : (
                  <>
                    {triesLeft} {triesLeft === 1 ? "try" : "tries"} left. Enter checks the answers.
                  </>
                )}
              </p>
            </div>
          )}
        </fieldset>
      </form>

      {assignment && final && problem.status === "open" ? <p className="text-sm font-semibold text-ink-soft">Answers are closed for this problem.</p> : null}
      {problem.tries && problem.tries.length > 0 ? (
        <details className="space-y-2" open={final}>
          <summary className="cursor-pointer text-sm font-semibold">
            Your tries ({problem.tries.length} of {problem.attemptsAllowed})
          </summary>
          <div className="pt-2">
            <PreviousTries tries={problem.tries} />
          </div>
        </details>
      ) : null}
      {!problem.final && problem.solutionAfter ? (
        <p className="card p-3 text-sm" data-solution-waits>
          {problem.status === "solved" ? "Solved. " : "Finished. "}The answers and the worked solution open after the due date, <LocalTime iso={problem.solutionAfter} />.
        </p>
      ) : null}

      {problem.final ? (
        <section aria-labelledby={`solution-${problem.id}`} className="card space-y-3 p-4" data-solution>
          <SubHeading id={`solution-${problem.id}`} ref={solutionRef} tabIndex={-1} className="text-xl">
            {problem.status === "solved" ? "Solved — here is the worked solution" : problem.status === "failed" ? "Out of tries — here is the worked solution" : "Closed — here is the worked solution"}
          </SubHeading>
          <dl className="grid gap-2 sm:grid-cols-2">
            {problem.parts.map((p) => (
              <div key={p.key} className="rounded border border-rule bg-paper p-2">
                <dt className="text-sm text-ink-soft">{p.label}</dt>
                <dd className="measure font-semibold" data-expected={p.key}>
                  {problem.final!.expected[p.key]}
                </dd>
              </div>
            ))}
          </dl>
          <ol className="list-decimal space-y-2 pl-6">
            {problem.final.stepsHtml.map((step, i) => (
              <li key={i} dangerouslySetInnerHTML={{ __html: step }} />
            ))}
          </ol>
          {assignment ? (
            <p data-chrome>
              <Link href={problem.lessonHref}>Read the lesson</Link>
            </p>
          ) : (
            <div data-chrome className="flex flex-wrap gap-3 pt-2">
              <button type="button" className="btn-primary" onClick={another} disabled={busy}>
                Another problem like this
              </button>
              <Link className="btn-quiet" href="/practice">
                Choose another skill
              </Link>
              <Link className="btn-quiet" href={problem.lessonHref}>
                Read the lesson
              </Link>
            </div>
          )}
          {signedIn || assignment ? null : (
            <p className="text-sm text-ink-soft">
              <Link href="/signup?callbackUrl=/practice">Sign up</Link> to keep your progress and unlock the next level as you master each one.
            </p>
          )}
        </section>
      ) : null}
    </article>
  );
}
