"use client";

import Link from "next/link";
import { useEffect, useRef, useState } from "react";
import type { ErrorBody } from "@/lib/errors";
import type { ProblemUpdate, ProblemView } from "@/lib/practice/view";
import { Alert } from "@/components/ui/alert";
import { useHydrated } from "@/components/ui/use-hydrated";
import { AnswerField } from "./answer-field";
import { ProblemFigureView } from "./problem-figure";

type Props = {
  initial: ProblemView;
  /** Called for "Another problem"; the standalone page navigates, a lesson swaps in place. */
  onAnother: (problem: ProblemView) => void;
  signedIn: boolean;
  headingLevel?: "h1" | "h2";
};

async function postJson<T>(url: string, body: unknown): Promise<{ ok: true; problem: T } | { ok: false; error: ErrorBody["error"] }> {
  try {
    const res = await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
    const json = await res.json();
    return res.ok ? { ok: true, problem: json.problem } : { ok: false, error: json.error };
  } catch {
    return { ok: false, error: { code: "unavailable", message: "Could not reach Sixteenths. Check your connection; your answers are still in the boxes." } };
  }
}

/** One practice problem: the prompt, an answer box per part, feedback per part, and the worked solution once final. */
export function ProblemWorkspace({ initial, onAnother, signedIn, headingLevel = "h1" }: Props) {
  const hydrated = useHydrated();
  const [problem, setProblem] = useState(initial);
  const [answers, setAnswers] = useState<Record<string, string>>(() => Object.fromEntries(initial.parts.map((p) => [p.key, initial.results[p.key]?.raw ?? ""])));
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string>();
  const [busy, setBusy] = useState(false);
  const started = useRef(0);
  const solutionRef = useRef<HTMLHeadingElement>(null);
  const final = problem.status !== "open";
  const Heading = headingLevel;

  useEffect(() => {
    started.current = Date.now();
  }, [problem.id, problem.attemptsUsed]);

  const submit = async (event: React.FormEvent) => {
    event.preventDefault();
    if (busy || final) return;
    setBusy(true);
    setFormError(undefined);
    const open = problem.parts.filter((p) => problem.results[p.key]?.verdict !== "correct");
    const result = await postJson<ProblemUpdate>(`/api/practice/${problem.id}/answers`, {
      answers: Object.fromEntries(open.map((p) => [p.key, answers[p.key] ?? ""])),
      timeMs: Math.min(Date.now() - started.current, 86_400_000),
    });
    setBusy(false);
    if (!result.ok) {
      setFieldErrors(result.error.fields ?? {});
      setFormError(result.error.message);
      return;
    }
    setFieldErrors({});
    setProblem((current) => ({ ...current, ...result.problem }));
    if (result.problem.status !== "open") requestAnimationFrame(() => solutionRef.current?.focus());
  };

  const another = async () => {
    setBusy(true);
    const result = await postJson<ProblemView>("/api/practice", { kind: problem.kind, level: problem.level });
    setBusy(false);
    if (!result.ok) return setFormError(result.error.message);
    setProblem(result.problem);
    setAnswers(Object.fromEntries(result.problem.parts.map((p) => [p.key, ""])));
    setFieldErrors({});
    onAnother(result.problem);
  };

  const triesLeft = problem.attemptsAllowed - problem.attemptsUsed;
  return (
    <article className="space-y-5" data-problem={problem.kind} data-status={problem.status} aria-labelledby={`problem-${problem.id}`}>
      <header className="space-y-1">
        <p className="text-sm text-ink-faint">
          {problem.skillTitle} · Level {problem.level}: {problem.levelLabel}
        </p>
        <Heading id={`problem-${problem.id}`} className={headingLevel === "h1" ? "text-2xl" : "text-xl"}>
          {problem.title}
        </Heading>
      </header>
      <div className="card space-y-3 p-4">
        <div className="space-y-3 leading-relaxed" dangerouslySetInnerHTML={{ __html: problem.promptHtml }} />
        {problem.figure ? <ProblemFigureView figure={problem.figure} /> : null}
      </div>

      <form onSubmit={submit} noValidate className="space-y-4" aria-label="Your answers">
        <fieldset disabled={!hydrated || busy} className="min-w-0 space-y-4">
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
          {final ? null : (
            <div className="flex flex-wrap items-center gap-3">
              <button type="submit" className="btn-primary">
                {busy ? "Checking…" : "Check answers"}
              </button>
              <p className="text-sm text-ink-soft" aria-live="polite">
                {triesLeft} {triesLeft === 1 ? "try" : "tries"} left. Enter checks the answers.
              </p>
            </div>
          )}
        </fieldset>
      </form>

      {problem.final ? (
        <section aria-labelledby={`solution-${problem.id}`} className="card space-y-3 p-4" data-solution>
          <h2 id={`solution-${problem.id}`} ref={solutionRef} tabIndex={-1} className="text-xl">
            {problem.status === "solved" ? "Solved — here is the worked solution" : "Out of tries — here is the worked solution"}
          </h2>
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
          {signedIn ? null : (
            <p className="text-sm text-ink-soft">
              <Link href="/signup?callbackUrl=/practice">Sign up</Link> to keep your progress and unlock the next level as you master each one.
            </p>
          )}
        </section>
      ) : null}
    </article>
  );
}
