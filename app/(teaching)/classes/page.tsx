import type { Metadata } from "next";
import Link from "next/link";
import { ActionButton } from "@/components/classes/action-button";
import { ClassCard } from "@/components/classes/class-card";
import { requireRole } from "@/lib/auth/session";
import { listTeachingClasses } from "@/lib/classes/queries";

export const metadata: Metadata = { title: "Classes" };

export default async function ClassesPage() {
  const user = await requireRole("instructor", "admin");
  const [classes, archived] = await Promise.all([listTeachingClasses(user), listTeachingClasses(user, { archived: true })]);
  return (
    <div className="space-y-8">
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div className="space-y-1">
          <h1 className="text-2xl">{user.role === "admin" ? "Every class" : "Classes you teach"}</h1>
          <p className="text-ink-soft">Open a class to see its roster, add students and find its join code.</p>
        </div>
        <Link href="/classes/new" className="btn-primary">
          New class
        </Link>
      </header>
      {classes.length === 0 ? (
        <div className="card space-y-2 p-6 text-ink-soft">
          <p className="font-semibold text-ink">No classes yet.</p>
          <p>
            Classes you lead or co-teach appear here. <Link href="/classes/new">Create your first class</Link>, then invite students or show them the join
            code.
          </p>
        </div>
      ) : (
        <ul className="grid gap-4 md:grid-cols-2">
          {classes.map((c) => (
            <li key={c.id}>
              <ClassCard summary={c} href={`/classes/${c.id}`} />
            </li>
          ))}
        </ul>
      )}
      <section aria-labelledby="archived-heading" className="space-y-3">
        <h2 id="archived-heading" className="text-xl">
          Archived classes
        </h2>
        {archived.length === 0 ? (
          <p className="text-ink-soft">None. Archive a class from its Settings when the term is over; it can be restored here.</p>
        ) : (
          <ul className="divide-y divide-rule rounded-lg border border-rule bg-paper-raised">
            {archived.map((c) => (
              <li key={c.id} className="flex flex-wrap items-center justify-between gap-3 px-4 py-3">
                <div>
                  <Link href={`/classes/${c.id}`} className="font-semibold">
                    {c.name}
                  </Link>
                  <p className="text-sm text-ink-soft">
                    {c.term} · {c.studentCount} student{c.studentCount === 1 ? "" : "s"} · led by {c.instructorName}
                  </p>
                </div>
                {c.myRole === "lead" || c.myRole === "admin" ? (
                  <ActionButton url={`/api/classes/${c.id}/restore`} label="Restore" accessibleLabel={`Restore ${c.name}`} pendingLabel="Restoring…" />
                ) : null}
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
