"use client";

import { useRouter } from "next/navigation";
import { useState, type ReactNode } from "react";
import type { ErrorBody } from "@/lib/errors";
import type { ProblemView } from "@/lib/practice/view";

export type StartRequest = { kind: string; level: number } | { next: true } | { skill: string };

export async function startProblem(body: StartRequest): Promise<{ ok: true; problem: ProblemView } | { ok: false; message: string }> {
  try {
    const res = await fetch("/api/practice", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
    const json = (await res.json()) as { problem: ProblemView } | ErrorBody;
    return "problem" in json ? { ok: true, problem: json.problem } : { ok: false, message: json.error.message };
  } catch {
    return { ok: false, message: "Could not reach Sixteenths. Check your connection and try again." };
  }
}

/** Starts a problem on the server and opens it at its own address (so a reload or the back button finds it). */
export function StartButton({ request, children, className = "btn-quiet", disabled = false }: { request: StartRequest; children: ReactNode; className?: string; disabled?: boolean }) {
  const router = useRouter();
  const [state, setState] = useState<{ busy: boolean; error?: string }>({ busy: false });
  return (
    <span className="inline-flex flex-col gap-1">
      <button
        type="button"
        className={className}
        disabled={disabled || state.busy}
        onClick={async () => {
          setState({ busy: true });
          const result = await startProblem(request);
          if (!result.ok) return setState({ busy: false, error: result.message });
          router.push(`/practice/${result.problem.id}`);
        }}
      >
        {state.busy ? "Starting…" : children}
      </button>
      {state.error ? (
        <span role="alert" className="text-sm text-danger">
          {state.error}
        </span>
      ) : null}
    </span>
  );
}
