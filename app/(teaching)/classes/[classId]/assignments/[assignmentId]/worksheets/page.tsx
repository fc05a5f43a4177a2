import type { Metadata } from "next";
import Link from "next/link";
import { KeySheet } from "@/components/worksheets/key-sheet";
import { WorksheetPrintStyles } from "@/components/worksheets/print-styles";
import { StudentSheet } from "@/components/worksheets/student-sheet";
import { WorksheetOptions } from "@/components/worksheets/worksheet-options";
import { Alert } from "@/components/ui/alert";
import { requireRole } from "@/lib/auth/session";
import { worksheetOptionsSchema, worksheetSet } from "@/lib/worksheets/worksheets";
import { idFrom, orPage } from "../../guard";

export const metadata: Metadata = { title: "Worksheets" };

export default async function WorksheetsPage({ params, searchParams }: PageProps<"/classes/[classId]/assignments/[assignmentId]/worksheets">) {
  const user = await requireRole("instructor", "admin");
  const [{ classId, assignmentId }, query] = await Promise.all([params, searchParams]);
  const options = worksheetOptionsSchema.parse({ key: query.key, student: query.student || undefined });
  const set = await orPage(worksheetSet(user, { classId: idFrom(classId), assignmentId: idFrom(assignmentId) }, options));
  const { assignment, students, keyMode } = set;
  const overview = `/classes/${assignment.classId}/assignments/${assignment.id}`;
  const sheets = keyMode === "only" ? [] : students;
  const keys = keyMode === "without" ? [] : students;

  return (
    <div className="space-y-6">
      <WorksheetPrintStyles />
      <nav aria-label="Breadcrumb" className="text-sm" data-chrome>
        <Link href="/classes">Classes</Link> <span aria-hidden="true">/</span> <Link href={`/classes/${assignment.classId}`}>{set.schoolClass.name}</Link> <span aria-hidden="true">/</span>{" "}
        <Link href={overview}>{assignment.title}</Link> <span aria-hidden="true">/</span> <span>Worksheets</span>
      </nav>
      <header className="space-y-3" data-chrome>
        <h1 className="text-2xl">Worksheets: {assignment.title}</h1>
        <p className="max-w-prose text-ink-soft">
          Each student gets a page with their own numbers — the same ones they see on screen, so paper and screen can be marked alike. The answer key follows, one page per student. Use your browser&apos;s print
          dialog (letter paper); the menus and these choices are left off the paper.
        </p>
        {assignment.published ? <WorksheetOptions keyMode={keyMode} student={students.length === 1 && set.roster.length > 1 ? students[0].studentId : undefined} roster={set.roster} pageCount={sheets.length + keys.length} /> : null}
      </header>

      {!assignment.published ? (
        <Alert>
          Worksheets are printed from a published assignment: until then its problems may still change, and with them every student&apos;s numbers. <Link href={overview}>Back to the assignment</Link>
        </Alert>
      ) : students.length === 0 ? (
        <p className="card p-4 text-ink-soft">
          No active students in this class yet, so there is nothing to print. <Link href={`/classes/${assignment.classId}`}>Invite students from the roster</Link>.
        </p>
      ) : (
        <div className="space-y-8" data-print-pages>
          {sheets.map((student) => (
            <StudentSheet key={`s${student.studentId}`} set={set} student={student} />
          ))}
          {keys.map((student) => (
            <KeySheet key={`k${student.studentId}`} set={set} student={student} />
          ))}
        </div>
      )}
    </div>
  );
}
