"use client";

import { useRouter } from "next/navigation";
import type { ProblemView } from "@/lib/practice/view";
import { ProblemWorkspace } from "./problem-workspace";

/** The standalone problem page: "another problem" moves to the new problem's own address. */
export function PracticeProblemClient({ initial, signedIn }: { initial: ProblemView; signedIn: boolean }) {
  const router = useRouter();
  return <ProblemWorkspace key={initial.id} initial={initial} signedIn={signedIn} onAnother={(p) => router.push(`/practice/${p.id}`)} />;
}
