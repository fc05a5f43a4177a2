"use client";

import Link from "next/link";
import { useEffect, useState } from "react";
import useSWR from "swr";

type ProgressMap = Record<string, "opened" | "completed" | "practised">;

// null means "not signed in": lessons are open to everyone, progress is kept for accounts.
async function fetchProgress(url: string): Promise<ProgressMap | null> {
  const res = await fetch(url);
  if (res.status === 401) return null;
  if (!res.ok) throw new Error("Could not load your progress.");
  return ((await res.json()) as { progress: ProgressMap }).progress;
}

function useProgress() {
  return useSWR("/api/progress", fetchProgress, { revalidateOnFocus: false });
}

async function record(slug: string, status: "opened" | "completed") {
  const res = await fetch("/api/progress", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ slug, status }) });
  if (!res.ok) throw new Error("not saved");
}

const LABEL = { opened: "Started", completed: "Completed", practised: "Practised" } as const;

export function LessonProgressBadge({ slug }: { slug: string }) {
  const { data } = useProgress();
  const status = data?.[slug];
  if (!status) return null;
  return (
    <span data-progress={status} className={`rounded-sm px-2 py-0.5 text-xs font-semibold ${status === "opened" ? "bg-chalk-light text-chalk-dark" : "bg-ok-bg text-ok"}`}>
      {status === "opened" ? "○" : "✓"} {LABEL[status]}
    </span>
  );
}

export function ProgressPrompt() {
  const { data, isLoading } = useProgress();
  if (isLoading || data !== null) return null;
  return (
    <p className="text-sm text-ink-soft">
      Reading without an account is fine. <Link href="/signup?callbackUrl=%2Flessons">Create a free account</Link> to keep track of the lessons you finish.
    </p>
  );
}

export function LessonProgressControls({ slug }: { slug: string }) {
  const { data, isLoading, mutate } = useProgress();
  const [problem, setProblem] = useState<string>();
  const signedIn = data !== null && data !== undefined;
  const status = data?.[slug];

  useEffect(() => {
    if (signedIn && !status) record(slug, "opened").then(() => mutate(), () => undefined);
  }, [signedIn, status, slug, mutate]);

  if (isLoading) return null;
  if (!signedIn) {
    return (
      <p data-chrome className="mt-8 rounded-lg bg-paper-sunk p-4 text-sm">
        <Link href={`/signup?callbackUrl=${encodeURIComponent(`/lessons/${slug}`)}`}>Create a free account</Link> or{" "}
        <Link href={`/signin?callbackUrl=${encodeURIComponent(`/lessons/${slug}`)}`}>sign in</Link> to mark lessons complete and keep your progress.
      </p>
    );
  }
  const done = status === "completed" || status === "practised";
  return (
    <div data-chrome className="mt-8 flex flex-wrap items-center gap-3 rounded-lg bg-paper-sunk p-4">
      {done ? (
        <p role="status" className="font-semibold text-ok">
          ✓ You completed this lesson.
        </p>
      ) : (
        <button
          type="button"
          className="btn-primary"
          onClick={async () => {
            setProblem(undefined);
            try {
              await record(slug, "completed");
              await mutate();
            } catch {
              setProblem("Could not save that. Check your connection and try again.");
            }
          }}
        >
          Mark lesson complete
        </button>
      )}
      {problem ? (
        <p role="alert" className="text-sm font-semibold text-danger">
          {problem}
        </p>
      ) : null}
    </div>
  );
}
