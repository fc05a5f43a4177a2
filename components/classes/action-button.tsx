"use client";

import { useRouter } from "next/navigation";
import { useId, useRef, useState, type ReactNode } from "react";
import { callApi } from "./api";

type Confirm = { title: string; body: ReactNode; confirmLabel: string };

type Props = {
  url: string;
  method?: "POST" | "DELETE";
  label: string;
  /** Read by screen readers when the visible label is short ("Remove" → "Remove Avery Castellanos"). */
  accessibleLabel?: string;
  pendingLabel: string;
  /** Asks first, in a modal dialog, for anything that is hard to undo. */
  confirm?: Confirm;
  tone?: "quiet" | "danger" | "primary";
  /** Where to go afterwards; by default the page re-reads its data. */
  then?: string;
  className?: string;
};

const TONES = {
  quiet: "btn-quiet",
  primary: "btn-primary",
  danger: "btn border-danger bg-paper-raised text-danger hover:bg-danger-bg",
};

/** A button that calls one class API route, optionally after a confirmation dialog, then refreshes the page. */
export function ActionButton({ url, method = "POST", label, accessibleLabel, pendingLabel, confirm, tone = "quiet", then, className }: Props) {
  const router = useRouter();
  const dialog = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string>();

  const run = async () => {
    setPending(true);
    setError(undefined);
    const result = await callApi(url, method);
    setPending(false);
    if (!result.ok) {
      setError(result.message);
      return;
    }
    dialog.current?.close();
    if (then) router.push(then);
    router.refresh();
  };

  return (
    <>
      <button
        type="button"
        className={`${TONES[tone]} ${className ?? ""}`}
        aria-label={accessibleLabel}
        disabled={pending}
        onClick={() => (confirm ? (setError(undefined), dialog.current?.showModal()) : run())}
      >
        {pending && !confirm ? pendingLabel : label}
      </button>
      {error && !confirm ? (
        <span role="alert" className="text-sm font-semibold text-danger">
          {error}
        </span>
      ) : null}
      {confirm ? (
        <dialog ref={dialog} aria-labelledby={titleId} className="card m-auto w-[min(28rem,calc(100vw-2rem))] p-0 text-left font-normal text-ink backdrop:bg-ink/40">
          <div className="space-y-4 p-5">
            <h2 id={titleId} className="text-lg">
              {confirm.title}
            </h2>
            <div className="space-y-2 text-ink-soft">{confirm.body}</div>
            {error ? (
              <p role="alert" className="font-semibold text-danger">
                {error}
              </p>
            ) : null}
            <div className="flex flex-wrap justify-end gap-2">
              <button type="button" className="btn-quiet" onClick={() => dialog.current?.close()} autoFocus>
                Cancel
              </button>
              <button type="button" className={tone === "primary" ? TONES.primary : TONES.danger} disabled={pending} onClick={run}>
                {pending ? pendingLabel : confirm.confirmLabel}
              </button>
            </div>
          </div>
        </dialog>
      ) : null}
    </>
  );
}
