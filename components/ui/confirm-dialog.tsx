"use client";

import { useId, type ReactNode } from "react";
import { useModal } from "./use-modal";

type Props = {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  tone?: "primary" | "danger";
  busy?: boolean;
  /** What the confirming button says while the action runs. */
  busyLabel?: string;
  /** Why the action failed; the dialog stays open so it can be tried again or cancelled. */
  error?: string;
  onConfirm: () => void;
  onCancel: () => void;
};

/**
 * A modal question before anything that sends mail or cannot be undone. The native <dialog>
 * traps focus, closes on Escape and returns focus to the button that opened it.
 */
export function ConfirmDialog({ open, title, children, confirmLabel, tone = "primary", busy = false, busyLabel = "Working…", error, onConfirm, onCancel }: Props) {
  const ref = useModal(open);
  const titleId = useId();
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(e) => {
        e.preventDefault();
        if (!busy) onCancel();
      }}
      className="m-auto w-[min(28rem,calc(100vw-2rem))] rounded-lg text-left font-normal border border-rule bg-paper-raised p-0 text-ink shadow-xl backdrop:bg-ink/40"
    >
      <div className="space-y-4 p-5">
        <h2 id={titleId} className="text-lg">
          {title}
        </h2>
        <div className="space-y-2 text-ink-soft">{children}</div>
        {error ? (
          <p role="alert" className="font-semibold text-danger">
            {error}
          </p>
        ) : null}
        <div className="flex flex-wrap justify-end gap-3">
          <button type="button" className="btn-quiet" onClick={onCancel} disabled={busy}>
            Cancel
          </button>
          <button type="button" className={tone === "danger" ? "btn border-danger bg-danger text-white hover:opacity-90" : "btn-primary"} onClick={onConfirm} disabled={busy}>
            {busy ? busyLabel : confirmLabel}
          </button>
        </div>
      </div>
    </dialog>
  );
}
