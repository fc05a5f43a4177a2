import { forwardRef, useId, type InputHTMLAttributes } from "react";

type Props = InputHTMLAttributes<HTMLInputElement> & { label: string; hint?: string; error?: string };

/** A labelled input whose hint and error are announced with it. */
export const TextField = forwardRef<HTMLInputElement, Props>(function TextField({ label, hint, error, id, className, ...input }, ref) {
  const generated = useId();
  const inputId = id ?? generated;
  const hintId = hint ? `${inputId}-hint` : undefined;
  const errorId = error ? `${inputId}-error` : undefined;
  return (
    <div className={className}>
      <label htmlFor={inputId} className="mb-1 block font-semibold">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="mb-1 text-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
      <input
        ref={ref}
        id={inputId}
        className="input"
        aria-invalid={error ? true : undefined}
        aria-describedby={[hintId, errorId].filter(Boolean).join(" ") || undefined}
        {...input}
      />
      {error ? (
        <p id={errorId} className="mt-1 text-sm font-semibold text-danger">
          {error}
        </p>
      ) : null}
    </div>
  );
});
