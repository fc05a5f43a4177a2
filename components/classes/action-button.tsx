"use client";

import { useRouter } from "next/navigation";
import { useState, type ReactNode } from "react";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { callApi } from "@/components/ui/call-api";

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
  const [asking, setAsking] = useState(false);
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
    setAsking(false);
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
        onClick={() => (confirm ? (setError(undefined), setAsking(true)) : run())}
      >
        {pending && !confirm ? pendingLabel : label}
      </button>
      {error && !confirm ? (
        <span role="alert" className="text-sm font-semibold text-danger">
          {error}
        </span>
      ) : null}
      {confirm ? (
        <ConfirmDialog
          open={asking}
          title={confirm.title}
          confirmLabel={confirm.confirmLabel}
          tone={tone === "primary" ? "primary" : "danger"}
          busy={pending}
          busyLabel={pendingLabel}
          error={error}
          onConfirm={run}
          onCancel={() => setAsking(false)}
        >
          {confirm.body}
        </ConfirmDialog>
      ) : null}
    </>
  );
}
