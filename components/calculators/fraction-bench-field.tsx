"use client";

import { useId, type ReactNode } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";
import type { Problem } from "./fraction-bench-results";
import { useHydrated } from "@/components/ui/use-hydrated";

/** One headed part of the bench, with its own small form and its answer beneath. */
export function BenchSection({ title, intro, children, printed = false }: { title: string; intro?: ReactNode; children: ReactNode; printed?: boolean }) {
  const id = useId();
  return (
    <section aria-labelledby={`${id}-h`} className={`card @container space-y-3 p-4 ${printed ? "print:border-0 print:bg-white print:p-0" : "print:hidden"}`}>
      <h2 id={`${id}-h`} className="text-lg">
        {title}
      </h2>
      {intro ? <div className="max-w-prose text-sm text-ink-soft">{intro}</div> : null}
      {children}
    </section>
  );
}

/** A small form of its own: Enter does nothing, and the print hides it with the other inputs. */
export function BenchForm({ label, children, className = "" }: { label: string; children: ReactNode; className?: string }) {
  const hydrated = useHydrated();
  return (
    <form data-chrome noValidate aria-label={label} onSubmit={(e) => e.preventDefault()}>
      <fieldset disabled={!hydrated} className={`min-w-0 space-y-2 ${className}`}>
        {children}
      </fieldset>
    </form>
  );
}

/** The typed text with the character the reader stopped at marked, or a caret where something is missing. */
export function PointedText({ text, index }: { text: string; index: number }) {
  const at = Math.max(0, Math.min(index, text.length));
  const char = text.slice(at, at + 1);
  return (
    <p aria-hidden="true" className="measure mt-1 overflow-x-auto whitespace-pre border-l-4 border-danger bg-paper-sunk px-2 py-0.5 text-sm text-ink" data-error-text>
      {text.slice(0, at)}
      <span data-error-at className="rounded-sm bg-danger-bg font-bold text-danger underline decoration-wavy decoration-2 underline-offset-4">
        {char === "" ? "‸" : char === " " ? "␣" : char}
      </span>
      {text.slice(at + 1)}
    </p>
  );
}

type FieldProps = {
  label: string;
  registration: UseFormRegisterReturn;
  value: string;
  problem?: Problem | null;
  /** Shown under the box when it reads: what the text was read as. */
  note?: ReactNode;
  /** Given the input element, for a caller that edits the text at the caret. */
  inputRef?: (element: HTMLInputElement | null) => void;
  inputMode?: "text" | "decimal";
};

/**
 * A text box for the bench: tape notation or a calculation. When the text cannot be read,
 * the message says why and the text is shown again with the place it went wrong marked.
 */
export function BenchField({ label, registration, value, problem, note, inputRef, inputMode = "text" }: FieldProps) {
  const id = useId();
  const { ref, ...rest } = registration;
  const setRefs = (element: HTMLInputElement | null) => {
    ref(element);
    inputRef?.(element);
  };
  const where = problem?.index !== undefined && !/character \d/.test(problem.message) ? ` (at character ${problem.index + 1})` : "";
  return (
    <div>
      <label htmlFor={id} className="mb-1 block text-sm font-semibold">
        {label}
      </label>
      <input
        id={id}
        type="text"
        inputMode={inputMode}
        autoComplete="off"
        autoCapitalize="off"
        spellCheck={false}
        className="input measure"
        aria-invalid={problem ? true : undefined}
        aria-describedby={`${id}-note`}
        ref={setRefs}
        {...rest}
      />
      <div id={`${id}-note`} className="mt-1 min-h-5 text-xs">
        {problem ? (
          <>
            <p className="font-semibold text-danger">
              {problem.message}
              <span className="sr-only">{where}</span>
            </p>
            {problem.index !== undefined && value !== "" ? <PointedText text={value} index={problem.index} /> : null}
          </>
        ) : (
          <div className="text-ink-soft">{note}</div>
        )}
      </div>
    </div>
  );
}
