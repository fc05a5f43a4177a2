import type { Metadata } from "next";
import Link from "next/link";
import { forbidden, notFound } from "next/navigation";
import { requireRole } from "@/lib/auth/session";
import { getClassWithRoster } from "@/lib/classes/queries";
import { AppError } from "@/lib/errors";

export const metadata: Metadata = { title: "Roster" };

const STATUS_STYLE = {
  active: "bg-ok-bg text-ok",
  invited: "bg-chalk-light text-chalk-dark",
  removed: "bg-paper-sunk text-ink-faint",
} as const;

async function load(classId: string, user: Awaited<ReturnType<typeof requireRole>>) {
  const id = Number(classId);
  if (!Number.isInteger(id) || id <= 0) notFound();
  try {
    return await getClassWithRoster(user, id);
  } catch (error) {
    if (error instanceof AppError && error.code === "forbidden") forbidden();
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}

export default async function RosterPage({ params, searchParams }: PageProps<"/classes/[classId]">) {
  const user = await requireRole("instructor", "admin");
  const [{ classId }, query] = await Promise.all([params, searchParams]);
  const { summary, roster } = await load(classId, user);
  const q = typeof query.q === "string" ? query.q.trim().toLowerCase() : "";
  const shown = q ? roster.filter((r) => r.name.toLowerCase().includes(q) || r.email.includes(q)) : roster;

  return (
    <div className="space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link href="/classes">Classes</Link> <span aria-hidden="true">/</span> <span>{summary.name}</span>
      </nav>
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl">{summary.name}</h1>
          <p className="text-ink-soft">
            {summary.term} · {summary.studentCount} students · led by {summary.instructorName}
          </p>
        </div>
        <div className="card px-4 py-2 text-center">
          <p className="text-xs font-semibold uppercase tracking-wide text-ink-faint">Join code</p>
          <p className="measure text-2xl font-bold tracking-[0.2em]">{summary.joinCode}</p>
        </div>
      </header>

      <section aria-labelledby="roster-heading" className="space-y-3">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <h2 id="roster-heading" className="text-xl">
            Roster
          </h2>
          <form role="search" className="flex gap-2">
            <label htmlFor="roster-q" className="sr-only">
              Search the roster by name or e-mail
            </label>
            <input id="roster-q" name="q" defaultValue={q} placeholder="Search name or e-mail" className="input w-56" />
            <button className="btn-quiet" type="submit">
              Search
            </button>
          </form>
        </div>
        {shown.length === 0 ? (
          <p className="card p-4 text-ink-soft">{q ? `No student matches “${q}”.` : "No students in this class yet."}</p>
        ) : (
          <div className="card overflow-x-auto">
            <table className="w-full text-left text-sm">
              <caption className="sr-only">Students in {summary.name}</caption>
              <thead className="border-b border-rule bg-paper-sunk">
                <tr>
                  <th scope="col" className="px-4 py-2">
                    Name
                  </th>
                  <th scope="col" className="hidden px-4 py-2 sm:table-cell">
                    E-mail
                  </th>
                  <th scope="col" className="px-4 py-2">
                    Status
                  </th>
                </tr>
              </thead>
              <tbody>
                {shown.map((r) => (
                  <tr key={r.studentId} className="border-b border-rule last:border-0">
                    <th scope="row" className="px-4 py-2 font-semibold">
                      {r.name}
                      <span className="block text-xs font-normal break-all text-ink-soft sm:hidden">{r.email}</span>
                    </th>
                    <td className="hidden px-4 py-2 break-all sm:table-cell">{r.email}</td>
                    <td className="px-4 py-2">
                      <span className={`rounded-sm px-2 py-0.5 text-xs font-semibold ${STATUS_STYLE[r.status]}`}>{r.status}</span>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
    </div>
  );
}
