"use client";

import { useCallback, useState } from "react";
import type { FieldPath, FieldValues, UseFormSetError, UseFormSetFocus } from "react-hook-form";
import type { ApiFailure } from "./call-api";

type Failure = Pick<ApiFailure, "message" | "fields">;

/**
 * Moves the focus to a field once it can take it: right after a refusal the form is often still
 * disabled while busy, or behind a confirm dialog that is closing, for a frame or two.
 */
export function focusWhenReady<T extends FieldValues>(setFocus: UseFormSetFocus<T>, name: FieldPath<T>) {
  retryFocus(() => setFocus(name), () => document.activeElement?.getAttribute("name") === name);
}

/** The first field marked invalid inside `container`, for forms not run by react-hook-form. */
export function focusFirstInvalid(container: () => HTMLElement | null) {
  const target = () => container()?.querySelector<HTMLElement>('[aria-invalid="true"]') ?? null;
  retryFocus(
    () => target()?.focus(),
    () => document.activeElement !== null && document.activeElement === target(),
  );
}

function retryFocus(focus: () => void, done: () => boolean) {
  let frames = 0;
  const attempt = () => {
    focus();
    if (!done() && ++frames < 30) requestAnimationFrame(attempt);
  };
  requestAnimationFrame(attempt);
}

/**
 * Puts a refusal from our JSON routes where the person will look: each message the server
 * tied to a field goes beside that field (react-hook-form marks it aria-invalid and the first
 * one gets the focus), and only what no field on this form can show becomes the form's banner.
 * `fieldNames` lists the form's fields, or matches them (the builder's `items.0.points`).
 */
export function useServerErrors<T extends FieldValues>(
  { setError, setFocus }: { setError: UseFormSetError<T>; setFocus: UseFormSetFocus<T> },
  fieldNames: readonly FieldPath<T>[] | RegExp,
) {
  const [formError, setFormError] = useState<string>();

  const showFailure = useCallback(
    (failure: Failure, { summary }: { summary?: string } = {}) => {
      const known = (name: string) => (fieldNames instanceof RegExp ? fieldNames.test(name) : (fieldNames as readonly string[]).includes(name));
      const onForm = Object.entries(failure.fields).filter(([name]) => known(name));
      for (const [name, message] of onForm) setError(name as FieldPath<T>, { type: "server", message });
      if (onForm.length > 0) focusWhenReady(setFocus, onForm[0][0] as FieldPath<T>);
      // A field the form does not show (or no field at all) still needs its words somewhere.
      const unshown = Object.entries(failure.fields).filter(([name]) => !known(name));
      if (onForm.length === 0) setFormError(failure.message);
      else if (unshown.length > 0) setFormError(unshown.map(([, message]) => message).join(" "));
      else setFormError(summary);
    },
    [setError, setFocus, fieldNames],
  );

  return { formError, setFormError, showFailure };
}
