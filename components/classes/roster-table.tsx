import Link from "next/link";
import type { RosterEntry } from "@/lib/classes/roster";
import { LocalTime } from "@/components/ui/local-time";
import { ActionButton } from "./action-button";
import { ScrollRegion } from "@/components/ui/scroll-region";

const STATUS_STYLE = {
  active: "bg-ok-bg text-ok",
  invited: "bg-chalk-light text-chalk-dark",
  removed: "bg-paper-sunk text-ink-faint",
} as const;

function RowActions({ classId, entry, archived }: { classId: number; entry: RosterEntry; archived: boolean }) {
  const base = `/api/classes/${classId}`;
  if (entry.invitationId !== null) {
    if (archived) return null;
    return (
      <div className="flex flex-wrap justify-end gap-2">
        <ActionButton url={`${base}/invitations/${entry.invitationId}/resend`} label="Resend" accessibleLabel={`Resend the invitation to ${entry.email}`} pendingLabel="Sending…" />
        <ActionButton
          url={`${base}/invitations/${entry.invitationId}/revoke`}
          label="Cancel"
          accessibleLabel={`Cancel the invitation to ${entry.email}`}
          pendingLabel="Cancelling…"
          confirm={{
            title: "Cancel this invitation?",
            body: (
              <p>
                The link sent to <span className="break-all font-semibold text-ink">{entry.email}</span> stops working. You can invite the address again later.
              </p>
            ),
            confirmLabel: "Cancel invitation",
          }}
        />
      </div>
    );
  }
  if (entry.status === "removed") {
    return archived ? null : (
      <ActionButton url={`${base}/students/${entry.studentId}/restore`} label="Add back" accessibleLabel={`Add ${entry.name} back to the class`} pendingLabel="Adding…" />
    );
  }
  return (
    <ActionButton
      url={`${base}/students/${entry.studentId}`}
      method="DELETE"
      label="Remove"
      accessibleLabel={`Remove ${entry.name} from the class`}
      pendingLabel="Removing…"
      confirm={{
        title: `Remove ${entry.name} from the class?`,
        body: (
          <>
            <p>They will no longer see the class or its assignments.</p>
            <p>Their answers, scores and shop photos are kept: add them back from the roster and everything is there again.</p>
          </>
        ),
        confirmLabel: "Remove student",
      }}
    />
  );
}

function StatusCell({ entry }: { entry: RosterEntry }) {
  return (
    <>
      <span className={`inline-block rounded-sm px-2 py-0.5 text-xs font-semibold ${STATUS_STYLE[entry.status]}`}>{entry.status}</span>
      {entry.invitationId !== null ? (
        <span className="mt-1 block text-xs text-ink-soft">
          {entry.expired ? (
            <span className="font-semibold text-caution">Link ran out; resend it</span>
          ) : (
            <>
              link good until <LocalTime iso={entry.expiresAt!} style="date" />
            </>
          )}
        </span>
      ) : null}
    </>
  );
}

export function RosterTable({ classId, className, entries, archived }: { classId: number; className: string; entries: RosterEntry[]; archived: boolean }) {
  return (
    <ScrollRegion labelledBy="roster-caption">
      <table className="w-full text-left text-sm">
        <caption id="roster-caption" className="sr-only">Students and invitations in {className}</caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            <th scope="col" className="px-4 py-2">
              Name
            </th>
            <th scope="col" className="hidden px-4 py-2 md:table-cell">
              E-mail
            </th>
            <th scope="col" className="hidden px-4 py-2 sm:table-cell">
              Status
            </th>
            <th scope="col" className="px-4 py-2 text-right">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {entries.map((entry) => (
            <tr key={entry.key} className="border-b border-rule last:border-0">
              <th scope="row" className="px-3 py-2 align-middle font-semibold sm:px-4">
                {entry.name}
                <span className="block text-xs font-normal break-all text-ink-soft md:hidden">{entry.email}</span>
                {/* On a phone the status sits under the name, so the name keeps the width. */}
                <span className="mt-1 block font-normal sm:hidden">
                  <StatusCell entry={entry} />
                </span>
              </th>
              <td className="hidden px-4 py-2 align-middle break-all md:table-cell">{entry.email}</td>
              <td className="hidden px-4 py-2 align-middle sm:table-cell">
                <StatusCell entry={entry} />
              </td>
              <td className="px-3 py-2 text-right align-middle sm:px-4">
                <RowActions classId={classId} entry={entry} archived={archived} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}

export function RosterEmpty({ classId }: { classId: number }) {
  const add = `/classes/${classId}/add-students`;
  return (
    <div className="card space-y-3 p-6">
      <p className="font-semibold">No students in this class yet.</p>
      <p className="text-ink-soft">Three ways to bring them in:</p>
      <ul className="list-disc space-y-1 pl-6">
        <li>
          <Link href={`/classes/${classId}/join-code`}>Show the join code</Link> on the projector; students enter it under My classes.
        </li>
        <li>
          <Link href={`${add}#invite`}>Invite by e-mail</Link>: each person gets a link to set a name and password.
        </li>
        <li>
          <Link href={`${add}#import`}>Import a roster file</Link> (CSV with names and e-mails) from the school office.
        </li>
      </ul>
    </div>
  );
}
