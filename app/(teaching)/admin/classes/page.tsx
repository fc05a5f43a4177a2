import type { Metadata } from "next";
import Link from "next/link";
import { DataTable, cell, measureCell, rowLine } from "@/components/calculators/data-table";
import { requireRole } from "@/lib/auth/session";
import { allClassesOverview } from "@/lib/progress/all-classes";

export const metadata: Metadata = { title: "All classes" };

const PAGE_SIZE = 25;

export default async function AllClassesPage({ searchParams }: PageProps<"/admin/classes">) {
  const user = await requireRole("admin");
  const params = await searchParams;
  const classes = await allClassesOverview(user);
  const pageCount = Math.max(1, Math.ceil(classes.length / PAGE_SIZE));
  const requested = Number(typeof params.page === "string" ? params.page : "1");
  const page = Number.isSafeInteger(requested) ? Math.min(Math.max(1, requested), pageCount) : 1;
  const shown = classes.slice((page - 1) * PAGE_SIZE, page * PAGE_SIZE);
  const students = classes.reduce((n, c) => n + c.students, 0);

  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <h1 className="text-2xl">All classes</h1>
        <p className="text-ink-soft">
          {classes.length} class{classes.length === 1 ? "" : "es"}, {students} active student places. The average is over every student&apos;s score on every published assignment; missing is
          the share of that work past its closing date with no try.
        </p>
      </header>
      {classes.length === 0 ? (
        <p className="card p-4 text-ink-soft">
          No classes yet. Instructors create them from <Link href="/classes">Classes</Link>.
        </p>
      ) : (
        <DataTable caption={`Classes, page ${page} of ${pageCount}`} columns={["Class", "Instructor", "Students", "Published", "Average", "Missing"]} data={{ "data-all-classes": classes.length }}>
          {shown.map((c) => (
            <tr key={c.id} className={rowLine} data-class-row={c.id}>
              <th scope="row" className={`${cell} font-semibold`}>
                <Link href={`/classes/${c.id}/progress`}>{c.name}</Link>
                <span className="block text-xs font-normal text-ink-faint">
                  {c.term}
                  {c.archived ? " · archived" : ""}
                </span>
              </th>
              <td className={cell}>{c.instructorName}</td>
              <td className={measureCell}>{c.students}</td>
              <td className={measureCell}>{c.publishedAssignments}</td>
              <td className={measureCell}>{c.average === null ? "—" : `${c.average} %`}</td>
              <td className={measureCell}>{c.missingPercent === null ? "—" : `${c.missingPercent} %`}</td>
            </tr>
          ))}
        </DataTable>
      )}
      {pageCount > 1 ? (
        <nav aria-label="Class pages" className="flex flex-wrap items-center justify-between gap-3 text-sm" data-chrome>
          <span className="text-ink-soft">
            Page {page} of {pageCount}
          </span>
          <span className="flex gap-2">
            {page > 1 ? (
              <Link className="btn-quiet" href={`/admin/classes?page=${page - 1}`} rel="prev">
                Previous page
              </Link>
            ) : null}
            {page < pageCount ? (
              <Link className="btn-quiet" href={`/admin/classes?page=${page + 1}`} rel="next">
                Next page
              </Link>
            ) : null}
          </span>
        </nav>
      ) : null}
    </div>
  );
}
