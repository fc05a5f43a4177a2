import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PracticeProblemClient } from "@/components/practice/practice-problem-client";
import { AppError } from "@/lib/errors";
import { ownerForPage } from "@/lib/practice/owner";
import { getProblem } from "@/lib/practice/problems";

export const metadata: Metadata = { title: "Practice problem" };

export default async function PracticeProblemPage({ params }: PageProps<"/practice/[id]">) {
  const { id } = await params;
  const owner = await ownerForPage();
  const problem = await getProblem(owner, id).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  return (
    <div className="max-w-3xl space-y-4">
      <nav aria-label="Breadcrumb" data-chrome className="text-sm">
        <Link href="/practice">Practice</Link> <span aria-hidden="true">/</span> {problem.skillTitle}
      </nav>
      <PracticeProblemClient initial={problem} signedIn={owner.user !== null} />
    </div>
  );
}
