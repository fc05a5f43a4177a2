import type { Metadata } from "next";
import Link from "next/link";
import { GradebookClient } from "@/components/gradebook/gradebook-client";
import { requireRole } from "@/lib/auth/session";
import { classForTeacher } from "@/lib/classes/queries";
import { gradebookOf } from "@/lib/gradebook/gradebook";
import { classIdOf, orPage } from "../load-class";

export const metadata: Metadata = { title: "Gradebook" };

export default async function GradebookPage({ params }: PageProps<"/classes/[classId]/gradebook">) {
  const user = await requireRole("instructor", "admin");
  const classId = classIdOf((await params).classId);
  const { summary, data } = await orPage(async () => {
    const summary = await classForTeacher(user, classId);
    return { summary, data: await gradebookOf(summary) };
  });
  return (
    <div className="space-y-6">
      {/* A wide grid reads best across the page. */}
      <style>{"@media print { @page { size: landscape; margin: 10mm; } }"}</style>
      <nav aria-label="Breadcrumb" className="text-sm" data-chrome>
        <Link href="/classes">Classes</Link> <span aria-hidden="true">/</span> <Link href={`/classes/${classId}`}>{summary.name}</Link> <span aria-hidden="true">/</span> <span>Gradebook</span>
      </nav>
      <header className="space-y-1">
        <h1 className="text-2xl">Gradebook</h1>
        <p className="text-ink-soft">
          {summary.name} · {summary.term} · {data.students.length} active student{data.students.length === 1 ? "" : "s"} · {data.assignments.length} published assignment{data.assignments.length === 1 ? "" : "s"}
        </p>
      </header>
      <GradebookClient initial={data} />
    </div>
  );
}
