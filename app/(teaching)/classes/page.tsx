import type { Metadata } from "next";
import { ClassCard } from "@/components/classes/class-card";
import { requireRole } from "@/lib/auth/session";
import { listTeachingClasses } from "@/lib/classes/queries";

export const metadata: Metadata = { title: "Classes" };

export default async function ClassesPage() {
  const user = await requireRole("instructor", "admin");
  const classes = await listTeachingClasses(user);
  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <h1 className="text-2xl">{user.role === "admin" ? "Every class" : "Classes you teach"}</h1>
        <p className="text-ink-soft">Open a class to see its roster and join code.</p>
      </header>
      {classes.length === 0 ? (
        <div className="card p-6 text-ink-soft">
          <p className="font-semibold text-ink">No classes yet.</p>
          <p>Classes you lead or co-teach appear here.</p>
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
    </div>
  );
}
