import type { Metadata } from "next";
import { ActionButton } from "@/components/classes/action-button";
import { ClassForm } from "@/components/classes/class-form";
import { ClassHeader } from "@/components/classes/class-header";
import { CoInstructors } from "@/components/classes/co-instructors";
import { requireRole } from "@/lib/auth/session";
import { classSettings } from "@/lib/classes/queries";
import { formatJoinCode } from "@/lib/classes/schemas";
import { classIdOf, orPage } from "../load-class";

export const metadata: Metadata = { title: "Class settings" };

export default async function ClassSettingsPage({ params }: PageProps<"/classes/[classId]/settings">) {
  const user = await requireRole("instructor", "admin");
  const classId = classIdOf((await params).classId);
  const { summary, lead, coInstructors } = await orPage(() => classSettings(user, classId));
  const isLead = summary.myRole === "lead" || summary.myRole === "admin";
  const api = `/api/classes/${classId}`;
  return (
    <div className="space-y-8">
      <ClassHeader summary={summary} current="settings" />

      <section aria-labelledby="details-heading" className="card space-y-4 p-5">
        <h2 id="details-heading" className="text-xl">
          Class details
        </h2>
        <ClassForm classId={classId} initial={{ name: summary.name, term: summary.term, sectionCode: summary.sectionCode ?? "", program: summary.program ?? "" }} />
      </section>

      <section aria-labelledby="join-heading" className="card space-y-3 p-5">
        <h2 id="join-heading" className="text-xl">
          Join code
        </h2>
        <p className="measure text-3xl font-bold tracking-[0.2em]">{formatJoinCode(summary.joinCode)}</p>
        <p className="text-ink-soft">If the code got out beyond the class, make a new one. Students already in the class stay in.</p>
        <div className="flex flex-wrap gap-2">
          <ActionButton
            url={`${api}/join-code`}
            label="Make a new code"
            pendingLabel="Making a new code…"
            tone="primary"
            confirm={{
              title: "Make a new join code?",
              body: <p>The code {formatJoinCode(summary.joinCode)} stops working at once. Anyone who has not joined yet needs the new code.</p>,
              confirmLabel: "Make a new code",
            }}
          />
        </div>
      </section>

      <section aria-labelledby="team-heading" className="card space-y-3 p-5">
        <h2 id="team-heading" className="text-xl">
          Instructors
        </h2>
        <p className="text-ink-soft">Co-instructors see the roster, invite students and build assignments, just like the lead.</p>
        <CoInstructors classId={classId} lead={lead} coInstructors={coInstructors} canManage={isLead} />
      </section>

      <section aria-labelledby="archive-heading" className="card space-y-3 p-5">
        <h2 id="archive-heading" className="text-xl">
          {summary.archivedAt ? "Restore the class" : "Archive the class"}
        </h2>
        {summary.archivedAt ? (
          <p className="text-ink-soft">Restoring puts the class back in the lists with its roster, join code and work as they were.</p>
        ) : (
          <p className="text-ink-soft">
            At the end of the term, archive the class: it leaves the lists and nobody can join, but nothing is deleted. You can restore it from the
            Archived classes list.
          </p>
        )}
        {!isLead ? (
          <p className="text-sm text-ink-soft">Only the lead instructor or a program admin can archive or restore a class.</p>
        ) : summary.archivedAt ? (
          <ActionButton url={`${api}/restore`} label="Restore class" pendingLabel="Restoring…" tone="primary" />
        ) : (
          <ActionButton
            url={`${api}/archive`}
            label="Archive class"
            pendingLabel="Archiving…"
            tone="danger"
            then="/classes"
            confirm={{
              title: `Archive ${summary.name}?`,
              body: (
                <>
                  <p>The class leaves your class list and students&apos; lists, and the join code stops working.</p>
                  <p>Nothing is deleted; restore it any time from Archived classes.</p>
                </>
              ),
              confirmLabel: "Archive class",
            }}
          />
        )}
      </section>
    </div>
  );
}
