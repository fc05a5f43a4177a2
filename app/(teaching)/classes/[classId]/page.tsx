import type { Metadata } from "next";
import Link from "next/link";
import { ClassHeader } from "@/components/classes/class-header";
import { RosterEmpty, RosterTable } from "@/components/classes/roster-table";
import { requireRole } from "@/lib/auth/session";
import { rosterPage } from "@/lib/classes/roster";
import { formatJoinCode, ROSTER_FILTERS, rosterQuerySchema, type RosterFilter } from "@/lib/classes/schemas";
import { classIdOf, orPage } from "./load-class";

export const metadata: Metadata = { title: "Roster" };

const FILTER_LABEL: Record<RosterFilter, string> = { all: "Everyone", active: "Active", invited: "Invited", removed: "Removed" };

export default async function RosterPage({ params, searchParams }: PageProps<"/classes/[classId]">) {
  const user = await requireRole("instructor", "admin");
  const [{ classId: raw }, search] = await Promise.all([params, searchParams]);
  const classId = classIdOf(raw);
  const parsed = rosterQuerySchema.safeParse({ q: search.q, status: search.status, page: search.page });
  const query = parsed.success ? parsed.data : rosterQuerySchema.parse({});
  const { summary, roster, counts, page, pageCount, total } = await orPage(() => rosterPage(user, classId, query));
  const base = `/classes/${classId}`;
  const href = (changes: Partial<{ q: string; status: RosterFilter; page: number }>) => {
    const next = { q: query.q, status: query.status, page: 1, ...changes };
    const qs = new URLSearchParams();
    if (next.q) qs.set("q", next.q);
    if (next.status !== "all") qs.set("status", next.status);
    if (next.page > 1) qs.set("page", String(next.page));
    const text = qs.toString();
    return text ? `${base}?${text}` : base;
  };
  const everyoneCount = query.q ? null : counts.all;

  return (
    <div className="space-y-6">
      <ClassHeader summary={summary} current="roster" />

      <div className="grid gap-4 md:grid-cols-2">
        <section aria-labelledby="code-heading" className="card flex flex-wrap items-center justify-between gap-3 p-4">
          <div>
            <h2 id="code-heading" className="text-xs font-semibold uppercase tracking-wide text-ink-faint">
              Join code
            </h2>
            <p className="measure text-2xl font-bold tracking-[0.2em]">{formatJoinCode(summary.joinCode)}</p>
          </div>
          <Link href={`${base}/join-code`} className="btn-quiet">
            Show on projector
          </Link>
        </section>
        {/* The assignments pages are their own area of the class; this is the way in. */}
        <section aria-labelledby="assignments-heading" className="card flex flex-wrap items-center justify-between gap-3 border-l-4 border-l-chalk p-4">
          <div>
            <h2 id="assignments-heading" className="text-lg">
              Assignments
            </h2>
            <p className="text-sm text-ink-soft">Build, publish and follow the class&apos;s layout work, and see where the class stands.</p>
          </div>
          <div className="flex flex-wrap gap-2">
            <Link href={`${base}/gradebook`} className="btn-quiet">
              Gradebook
            </Link>
            <Link href={`${base}/progress`} className="btn-quiet">
              Progress
            </Link>
            <Link href={`${base}/assignments`} className="btn-primary">
              Assignments
            </Link>
          </div>
        </section>
      </div>

      <section aria-labelledby="roster-heading" className="space-y-3">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <h2 id="roster-heading" className="text-xl">
            Roster
          </h2>
          <Link href={`${base}/add-students`} className="btn-quiet" data-chrome>
            Add students
          </Link>
        </div>
        {everyoneCount === 0 ? (
          <RosterEmpty classId={classId} />
        ) : (
          <>
            <div className="flex flex-wrap items-end justify-between gap-3" data-chrome>
              <nav aria-label="Filter the roster by status" className="flex flex-wrap gap-1">
                {ROSTER_FILTERS.map((status) => (
                  <Link
                    key={status}
                    href={href({ status })}
                    aria-current={status === query.status ? "page" : undefined}
                    className={`rounded-full border px-3 py-1 text-sm font-semibold no-underline ${status === query.status ? "border-chalk-dark bg-chalk text-white" : "border-rule-strong text-ink hover:bg-paper-sunk"}`}
                  >
                    {FILTER_LABEL[status]} <span className="measure">{counts[status]}</span>
                  </Link>
                ))}
              </nav>
              <form role="search" className="flex w-full gap-2 sm:w-auto" action={base}>
                {query.status !== "all" ? <input type="hidden" name="status" value={query.status} /> : null}
                <label htmlFor="roster-q" className="sr-only">
                  Search the roster by name or e-mail
                </label>
                <input id="roster-q" name="q" defaultValue={query.q} placeholder="Search name or e-mail" className="input min-w-0 flex-1 sm:w-56" />
                <button className="btn-quiet" type="submit">
                  Search
                </button>
              </form>
            </div>
            {roster.length === 0 ? (
              <p className="card p-4 text-ink-soft">
                {query.q ? `No student matches “${query.q}”.` : `Nobody is ${query.status} in this class.`}{" "}
                {query.q || query.status !== "all" ? <Link href={base}>Show everyone</Link> : null}
              </p>
            ) : (
              <RosterTable classId={classId} className={summary.name} entries={roster} archived={Boolean(summary.archivedAt)} />
            )}
            {pageCount > 1 ? (
              <nav aria-label="Roster pages" className="flex flex-wrap items-center justify-between gap-3 text-sm" data-chrome>
                <span className="text-ink-soft">
                  Page {page} of {pageCount} · {total} people
                </span>
                <span className="flex gap-2">
                  {page > 1 ? (
                    <Link className="btn-quiet" href={href({ page: page - 1 })} rel="prev">
                      Previous page
                    </Link>
                  ) : null}
                  {page < pageCount ? (
                    <Link className="btn-quiet" href={href({ page: page + 1 })} rel="next">
                      Next page
                    </Link>
                  ) : null}
                </span>
              </nav>
            ) : null}
          </>
        )}
      </section>
    </div>
  );
}
