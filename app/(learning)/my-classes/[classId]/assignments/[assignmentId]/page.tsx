import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { WorkClient } from "@/components/assignments/work-client";
import { WorkDates } from "@/components/assignments/work-dates";
import { Alert } from "@/components/ui/alert";
import { LocalTime } from "@/components/ui/local-time";
import { MarkdownText } from "@/components/ui/markdown";
import { PhotoUploader } from "@/components/uploads/photo-uploader";
import { studentAssignment } from "@/lib/assignments/work";
import { requireUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { listUploads } from "@/lib/uploads/store";

export const metadata: Metadata = { title: "Assignment" };

export default async function StudentAssignmentPage({ params }: PageProps<"/my-classes/[classId]/assignments/[assignmentId]">) {
  const user = await requireUser();
  const { classId, assignmentId } = await params;
  const view = await studentAssignment(user, Number(assignmentId), Number(classId)).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  const { assignment, timing } = view;
  const photos = await listUploads(user, assignment.id, user.id);

  return (
    <div className="max-w-3xl space-y-6">
      <nav aria-label="Breadcrumb" data-chrome className="text-sm">
        <Link href="/my-classes">My classes</Link> <span aria-hidden="true">/</span> <Link href={`/my-classes/${assignment.classId}`}>{assignment.className}</Link>{" "}
        <span aria-hidden="true">/</span> <span>{assignment.title}</span>
      </nav>
      <header className="space-y-3">
        <h1 className="text-2xl">{assignment.title}</h1>
        <WorkDates timing={timing} />
        <p className="text-sm text-ink-soft">
          {assignment.latePolicyText}{" "}
          {assignment.reveal === "after-due" ? "Answers and worked solutions open after the due date." : "Each problem shows its answer and worked solution once you solve it or use your last try."}
        </p>
      </header>

      {timing.window === "upcoming" ? (
        <Alert tone="info">
          This assignment opens <LocalTime iso={timing.opensAt} />. Your problems appear then.
        </Alert>
      ) : timing.window === "late-window" ? (
        <Alert tone="info">
          The due date has passed. Work is still taken until <LocalTime iso={timing.closesAt} />, and counts as late.
        </Alert>
      ) : timing.window === "closed" ? (
        <Alert tone="info">
          This assignment is closed: answers were taken until <LocalTime iso={timing.closesAt} />.
        </Alert>
      ) : null}

      {assignment.instructions.trim() ? (
        <section aria-labelledby="instructions-heading" className="card space-y-2 p-4">
          <h2 id="instructions-heading" className="text-lg">
            Instructions
          </h2>
          <MarkdownText text={assignment.instructions} />
        </section>
      ) : null}

      <WorkClient initial={view} />

      {/* Photos are taken while the assignment takes this student's work, as answers are. */}
      <PhotoUploader assignmentId={assignment.id} initial={photos} open={timing.window === "open" || timing.window === "late-window"} />
    </div>
  );
}
