import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AssignmentBuilder } from "@/components/assignments/assignment-builder";
import { Alert } from "@/components/ui/alert";
import { requireRole } from "@/lib/auth/session";
import { getTeacherAssignment, kindCatalog } from "@/lib/assignments/teacher-views";
import { idFrom, orPage } from "../../guard";

export const metadata: Metadata = { title: "Edit assignment" };

export default async function EditAssignmentPage({ params, searchParams }: PageProps<"/classes/[classId]/assignments/[assignmentId]/edit">) {
  const user = await requireRole("instructor", "admin");
  const [{ classId, assignmentId }, query] = await Promise.all([params, searchParams]);
  const a = await orPage(getTeacherAssignment(user, idFrom(assignmentId)));
  if (a.classId !== idFrom(classId)) notFound();
  return (
    <div className="mx-auto max-w-4xl space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm" data-chrome>
        <Link href="/classes">Classes</Link> <span aria-hidden="true">/</span> <Link href={`/classes/${a.classId}`}>{a.className}</Link> <span aria-hidden="true">/</span>{" "}
        <Link href={`/classes/${a.classId}/assignments`}>Assignments</Link> <span aria-hidden="true">/</span> <Link href={`/classes/${a.classId}/assignments/${a.id}`}>{a.title}</Link>{" "}
        <span aria-hidden="true">/</span> <span>Edit</span>
      </nav>
      <header>
        <h1 className="text-2xl">Edit “{a.title}”</h1>
        <p className="text-ink-soft">{a.className}</p>
      </header>
      {query.copied ? <Alert tone="success">This is a new draft copy. Adjust it, then save or publish.</Alert> : null}
      {a.locked ? (
        <Alert tone="info">Published before: the problems and tries per problem are fixed. Title, instructions, dates, late work and when solutions show can still change.</Alert>
      ) : null}
      <AssignmentBuilder classId={a.classId} className={a.className} activeStudents={a.activeStudents} kinds={kindCatalog()} existing={a} />
    </div>
  );
}
