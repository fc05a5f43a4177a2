import type { Metadata } from "next";
import Link from "next/link";
import { listUsers } from "@/lib/accounts/users";
import { requireRole } from "@/lib/auth/session";
import { ScrollRegion } from "@/components/ui/scroll-region";

export const metadata: Metadata = { title: "Users" };

const PAGE_SIZE = 20;

export default async function UsersPage({ searchParams }: PageProps<"/admin/users">) {
  await requireRole("admin");
  const params = await searchParams;
  const requested = Number(typeof params.page === "string" ? params.page : "1");
  const { users, page, pageCount, total } = await listUsers({ page: Number.isFinite(requested) ? requested : 1, pageSize: PAGE_SIZE });
  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <h1 className="text-2xl">Users</h1>
        <p className="text-ink-soft">{total} accounts: instructors, students and program admins.</p>
      </header>
      <ScrollRegion labelledBy="users-caption">
        <table className="w-full text-left text-sm">
          <caption id="users-caption" className="sr-only">
            Accounts, page {page} of {pageCount}
          </caption>
          <thead className="border-b border-rule bg-paper-sunk">
            <tr>
              <th scope="col" className="px-4 py-2">
                Name
              </th>
              <th scope="col" className="hidden px-4 py-2 sm:table-cell">
                E-mail
              </th>
              <th scope="col" className="px-4 py-2">
                Role
              </th>
              <th scope="col" className="hidden px-4 py-2 sm:table-cell">
                Since
              </th>
            </tr>
          </thead>
          <tbody>
            {users.map((u) => (
              <tr key={u.id} className="border-b border-rule last:border-0">
                <th scope="row" className="px-4 py-2 font-semibold">
                  {u.name}
                  <span className="block text-xs font-normal break-all text-ink-soft sm:hidden">{u.email}</span>
                </th>
                <td className="hidden px-4 py-2 break-all sm:table-cell">{u.email}</td>
                <td className="px-4 py-2">{u.role}</td>
                <td className="measure hidden whitespace-nowrap px-4 py-2 sm:table-cell">{u.createdAt.slice(0, 10)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
      {pageCount > 1 ? (
        <nav aria-label="Pages" className="flex items-center justify-between gap-3">
          {page > 1 ? (
            <Link className="btn-quiet" href={`/admin/users?page=${page - 1}`} rel="prev">
              Previous
            </Link>
          ) : (
            <span />
          )}
          <span className="text-sm text-ink-soft">
            Page {page} of {pageCount}
          </span>
          {page < pageCount ? (
            <Link className="btn-quiet" href={`/admin/users?page=${page + 1}`} rel="next">
              Next
            </Link>
          ) : (
            <span />
          )}
        </nav>
      ) : null}
    </div>
  );
}
