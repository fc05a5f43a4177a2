import type { Metadata } from "next";
import Link from "next/link";
import { AssignmentBuilder } from "@/components/assignments/assignment-builder";
import { requireRole } from "@/lib/auth/session";
import { classForTeacher, kindCatalog } from "@/lib/assignments/teacher-views";
import { idFrom, orPage } from "../guard";

export const metadata: Metadata = { title: "Build an assignment" };

export default async function NewAssignmentPage({ params }: PageProps<"/classes/[classId]/assignments/new">) {
  const user = await requireRole("instructor", "admin");
  const id = idFrom((await params).classId);
  const klass = await orPage(classForTeacher(user, id));
  return (
    <div className="mx-auto max-w-4xl space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm" data-chrome>
        <Link href="/classes">Classes</Link> <span aria-hidden="true">/</span> <Link href={`/classes/${id}`}>{klass.name}</Link> <span aria-hidden="true">/</span>{" "}
        <Link href={`/classes/${id}/assignments`}>Assignments</Link> <span aria-hidden="true">/</span> <span>New</span>
      </nav>
      <header>
        <h1 className="text-2xl">Build an assignment</h1>
        <p className="text-ink-soft">For {klass.name}. Nothing reaches students until you publish.</p>
      </header>
      <AssignmentBuilder classId={id} className={klass.name} activeStudents={klass.activeStudents} kinds={kindCatalog()} existing={null} />
    </div>
  );
}
