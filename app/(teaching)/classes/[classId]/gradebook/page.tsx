import type { Metadata } from "next";
import { ClassHeader } from "@/components/classes/class-header";
import { GradebookClient } from "@/components/gradebook/gradebook-client";
import { requireRole } from "@/lib/auth/session";
import { classForTeacher } from "@/lib/classes/queries";
import { gradebook } from "@/lib/gradebook/gradebook";
import { classIdOf, orPage } from "../load-class";

export const metadata: Metadata = { title: "Gradebook" };

export default async function GradebookPage({ params }: PageProps<"/classes/[classId]/gradebook">) {
  const user = await requireRole("instructor", "admin");
  const classId = classIdOf((await params).classId);
  const [summary, data] = await orPage(() => Promise.all([classForTeacher(user, classId), gradebook(user, classId)]));
  return (
    <div className="space-y-6">
      {/* A wide grid reads best across the page. */}
      <style>{"@media print { @page { size: landscape; margin: 10mm; } }"}</style>
      <ClassHeader summary={summary} current="roster" title="Gradebook" />
      <GradebookClient initial={data} />
    </div>
  );
}
