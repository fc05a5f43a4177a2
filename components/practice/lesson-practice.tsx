"use client";

import dynamic from "next/dynamic";
import { useState } from "react";
import type { ProblemView } from "@/lib/practice/view";
import { useCurrentUser } from "@/components/shell/use-current-user";
import { startProblem } from "./start-button";

// The workspace (answer reader, grader's words, figures) is only shown after a click, so it stays out
// of every lesson's first load; the click fetches its chunk alongside the new problem.
const loadWorkspace = () => import("./problem-workspace").then((m) => m.ProblemWorkspace);
const ProblemWorkspace = dynamic(loadWorkspace, { ssr: false });

/**
 * A live problem inside a lesson. The lesson page is static, so the problem is only created
 * when the reader asks for one — each reader gets their own numbers, graded on the server.
 */
export function LessonPractice({ skill, title }: { skill: string; title: string }) {
  const { data: user } = useCurrentUser();
  const [problem, setProblem] = useState<ProblemView>();
  const [state, setState] = useState<{ busy: boolean; error?: string }>({ busy: false });

  if (problem) {
    return (
      <div className="card my-6 p-4" data-lesson-practice={skill}>
        <ProblemWorkspace key={problem.id} initial={problem} signedIn={Boolean(user)} headingLevel="h2" onAnother={setProblem} />
      </div>
    );
  }
  return (
    <aside data-chrome data-lesson-practice={skill} className="my-6 space-y-2 rounded-lg border border-rule bg-paper-sunk p-4">
      <p className="font-semibold">Try one: {title}</p>
      <p className="text-ink-soft">A problem with your own numbers, checked as you go, with the worked solution at the end.</p>
      <button
        type="button"
        className="btn-primary"
        disabled={state.busy}
        onClick={async () => {
          setState({ busy: true });
          const [result] = await Promise.all([startProblem({ skill }), loadWorkspace().catch(() => undefined)]);
          if (!result.ok) return setState({ busy: false, error: result.message });
          setProblem(result.problem);
          setState({ busy: false });
        }}
      >
        {state.busy ? "Starting…" : "Start a practice problem"}
      </button>
      {state.error ? (
        <p role="alert" className="text-sm text-danger">
          {state.error}
        </p>
      ) : null}
    </aside>
  );
}
