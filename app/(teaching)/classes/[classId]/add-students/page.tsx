import type { Metadata } from "next";
import Link from "next/link";
import { ClassHeader } from "@/components/classes/class-header";
import { InviteForm } from "@/components/classes/invite-form";
import { RosterImport } from "@/components/classes/roster-import";
import { requireRole } from "@/lib/auth/session";
import { classForTeacher } from "@/lib/classes/queries";
import { formatJoinCode } from "@/lib/classes/schemas";
import { classIdOf, orPage } from "../load-class";

export const metadata: Metadata = { title: "Add students" };

export default async function AddStudentsPage({ params }: PageProps<"/classes/[classId]/add-students">) {
  const user = await requireRole("instructor", "admin");
  const classId = classIdOf((await params).classId);
  const summary = await orPage(() => classForTeacher(user, classId));
  const base = `/classes/${classId}`;
  return (
    <div className="space-y-8">
      <ClassHeader summary={summary} current="add" />
      {summary.archivedAt ? (
        <p className="card p-4 text-ink-soft">
          An archived class takes no new students. <Link href={`${base}/settings`}>Restore it in Settings</Link> first.
        </p>
      ) : (
        <>
          <section aria-labelledby="code-heading" className="card space-y-2 p-5">
            <h2 id="code-heading" className="text-xl">
              In the shop: the join code
            </h2>
            <p className="text-ink-soft">
              Students who already have an account enter <span className="measure font-bold tracking-widest text-ink">{formatJoinCode(summary.joinCode)}</span> under
              My classes. <Link href={`${base}/join-code`}>Show it large on the projector</Link>.
            </p>
          </section>
          <section id="invite" aria-labelledby="invite-heading" className="card scroll-mt-4 space-y-3 p-5">
            <div className="space-y-1">
              <h2 id="invite-heading" className="text-xl">
                Invite by e-mail
              </h2>
              <p className="text-ink-soft">Each person gets a link that works once for 7 days: newcomers choose a name and password, students with an account join with one click.</p>
            </div>
            <InviteForm classId={classId} />
          </section>
          <section id="import" aria-labelledby="import-heading" className="card scroll-mt-4 space-y-3 p-5">
            <div className="space-y-1">
              <h2 id="import-heading" className="text-xl">
                Import a roster file
              </h2>
              <p className="text-ink-soft">You see every row and what will happen to it before anything is sent; then all the good rows go in one step.</p>
            </div>
            <RosterImport classId={classId} />
          </section>
        </>
      )}
    </div>
  );
}
