import type { StudentAssignmentView } from "@/lib/assignments/work";
import { LocalTime } from "@/components/ui/local-time";

/** Opens, due (with the student's extension named) and the last day late work is taken. */
export function WorkDates({ timing }: { timing: StudentAssignmentView["timing"] }) {
  return (
    <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-3">
      <div>
        <dt className="text-ink-faint">Opens</dt>
        <dd className="font-semibold">
          <LocalTime iso={timing.opensAt} />
        </dd>
      </div>
      <div>
        <dt className="text-ink-faint">{timing.extended ? "Due (your extension)" : "Due"}</dt>
        <dd className="font-semibold" data-due>
          <LocalTime iso={timing.dueAt} />
          {timing.extended ? (
            <span className="block text-xs font-normal text-ink-soft">
              class due date <LocalTime iso={timing.originalDueAt} />
            </span>
          ) : null}
          {timing.extraAttempts > 0 ? (
            <span className="block text-xs font-normal text-ink-soft">
              plus {timing.extraAttempts} extra {timing.extraAttempts === 1 ? "try" : "tries"} per problem
            </span>
          ) : null}
        </dd>
      </div>
      {timing.closesAt !== timing.dueAt ? (
        <div>
          <dt className="text-ink-faint">Late work taken until</dt>
          <dd className="font-semibold">
            <LocalTime iso={timing.closesAt} />
          </dd>
        </div>
      ) : null}
    </dl>
  );
}
