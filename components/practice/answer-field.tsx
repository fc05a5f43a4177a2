"use client";

import { useEffect, useId, useRef } from "react";
import { readAnswer } from "@/lib/grading/grade";
import type { PartView } from "@/lib/practice/present";
import type { PartResult } from "@/lib/practice/view";

const VERDICT_TEXT = { correct: "Right", imprecise: "Close", incorrect: "Not right" } as const;
const VERDICT_STYLE = { correct: "border-ok bg-ok-bg text-ok", imprecise: "border-caution-edge bg-caution-bg text-caution", incorrect: "border-danger bg-danger-bg text-danger" } as const;

// Characters a phone keyboard hides behind a second layer; a tap puts them at the cursor.
const SHORTCUTS = [
  { text: " ", label: "space" },
  { text: "/", label: "/" },
  { text: "'", label: "′ feet" },
  { text: '"', label: "″ inches" },
];

type Props = {
  part: PartView;
  value: string;
  onChange: (value: string) => void;
  result: PartResult | null;
  /** A server message about this box (unreadable text). */
  error?: string;
  locked: boolean;
};

/** One answer box: tape notation in, a live "reads as" beneath (the same reader the grader uses). */
export function AnswerField({ part, value, onChange, result, error, locked }: Props) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const preview = value.trim() === "" ? null : readAnswer({ key: part.key, label: part.label, answer: part.answer, precision: 64 }, value);
  const describedBy = [`${id}-hint`, `${id}-reads`, result ? `${id}-result` : "", error ? `${id}-error` : ""].filter(Boolean).join(" ");

  // Text typed into the server's HTML before the page hydrated is the answer so far.
  useEffect(() => {
    const typed = input.current?.value;
    if (typed !== undefined && typed !== value) onChange(typed);
  }, []); // eslint-disable-line react-hooks/exhaustive-deps

  const insert = (text: string) => {
    const el = input.current;
    if (!el) return;
    const start = el.selectionStart ?? value.length;
    const end = el.selectionEnd ?? value.length;
    onChange(value.slice(0, start) + text + value.slice(end));
    requestAnimationFrame(() => {
      el.focus();
      el.setSelectionRange(start + text.length, start + text.length);
    });
  };

  return (
    <div className="space-y-1" data-part={part.key}>
      <label htmlFor={id} className="block font-semibold">
        {part.label}
      </label>
      <p id={`${id}-hint`} className="text-sm text-ink-faint">
        {part.hint}
      </p>
      <div className="flex flex-wrap items-center gap-2">
        <input
          ref={input}
          id={id}
          name={part.key}
          className="input measure max-w-60"
          value={value}
          onChange={(e) => onChange(e.target.value)}
          readOnly={locked}
          autoComplete="off"
          spellCheck={false}
          inputMode={part.answer === "count" ? "numeric" : "text"}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
        />
        {part.answer === "count" || locked ? null : (
          <span className="flex gap-1" role="group" aria-label={`Insert into ${part.label}`}>
            {SHORTCUTS.map((s) => (
              <button key={s.label} type="button" className="btn-quiet min-w-10 px-2 text-sm" onClick={() => insert(s.text)} aria-label={`Insert ${s.label}`}>
                {s.text === " " ? "␣" : s.text}
              </button>
            ))}
          </span>
        )}
      </div>
      <p id={`${id}-reads`} className="measure min-h-6 text-sm text-ink-soft" aria-live="polite">
        {preview === null ? "" : preview.ok ? `reads as ${preview.readAs}` : preview.message}
      </p>
      {error ? (
        <p id={`${id}-error`} className="text-sm font-semibold text-danger">
          {error}
        </p>
      ) : null}
      {result ? (
        <div id={`${id}-result`} className={`rounded border-l-4 p-2 text-sm ${VERDICT_STYLE[result.verdict]}`} data-verdict={result.verdict}>
          <p className="font-semibold">
            {VERDICT_TEXT[result.verdict]}: you answered <span className="measure">{result.readAs}</span>
            {result.patternName ? <span data-pattern={result.pattern}> · {result.patternName}</span> : null}
          </p>
          <p className="text-ink">{result.message}</p>
          {result.lessonHref ? (
            <p>
              <a href={result.lessonHref}>Read that part of the lesson</a>
            </p>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
