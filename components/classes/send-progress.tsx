"use client";

import useSWR from "swr";
import type { BatchProgress } from "@/lib/classes/invitations";
import { callApi } from "@/components/ui/call-api";

async function fetchProgress(url: string): Promise<BatchProgress> {
  const result = await callApi<BatchProgress>(url, "GET");
  if (!result.ok) throw new Error(result.message);
  return result.data;
}

/** Polls the outbox for one send until every e-mail has gone (or has been given up on). */
export function SendProgress({ classId, batch }: { classId: number; batch: string }) {
  const { data, error } = useSWR(`/api/classes/${classId}/invitations/batches/${batch}`, fetchProgress, {
    // Fast while mail is moving; slower while only retries are left, since those wait 15 s or more.
    refreshInterval: (latest) => (!latest || !latest.done ? (latest && latest.retrying.length === latest.waiting ? 5000 : 1000) : 0),
    revalidateOnFocus: false,
  });
  if (error && !data) return <p className="text-sm font-semibold text-danger">Could not read the sending progress: {String(error.message)}</p>;
  if (!data) return <p className="text-sm text-ink-soft">Checking the e-mails…</p>;
  const share = data.total === 0 ? 1 : data.sent / data.total;
  const label = `${data.sent} of ${data.total} e-mail${data.total === 1 ? "" : "s"} sent`;
  return (
    <div className="space-y-2" aria-live="polite">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="font-semibold" data-testid="send-progress">
          {label}
          {data.done && data.failed.length === 0 ? " — done." : ""}
        </p>
        {!data.done ? <span className="text-sm text-ink-soft">Sending…</span> : null}
      </div>
      <progress className="h-3 w-full accent-chalk" max={data.total} value={data.sent} aria-label={label}>
        {Math.round(share * 100)}%
      </progress>
      {data.retrying.length > 0 ? (
        <p className="text-sm text-caution">
          Not delivered yet, will retry automatically: <span className="break-all">{data.retrying.join(", ")}</span>
        </p>
      ) : null}
      {data.failed.length > 0 ? (
        <p className="text-sm font-semibold text-danger">
          Could not be delivered after several tries: <span className="break-all">{data.failed.join(", ")}</span>. Check the addresses, then resend
          from the roster.
        </p>
      ) : null}
    </div>
  );
}
