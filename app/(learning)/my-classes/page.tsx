import type { Metadata } from "next";
import Link from "next/link";
import { ClassCard } from "@/components/classes/class-card";
import { requireUser } from "@/lib/auth/session";
import { listStudentClasses } from "@/lib/classes/queries";

export const metadata: Metadata = { title: "My classes" };

export default async function MyClassesPage() {
  const user = await requireUser();
  const classes = await listStudentClasses(user);
  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <h1 className="text-2xl">My classes</h1>
        <p className="text-ink-soft">The classes you are enrolled in.</p>
      </header>
      {classes.length === 0 ? (
        <div className="card space-y-2 p-6">
          <p className="font-semibold">You are not in a class.</p>
          <p className="text-ink-soft">
            That is fine for learning on your own. If you are taking a course, your instructor will send an invitation to your e-mail.
          </p>
          <p>
            <Link href="/safety">Read the shop safety notes</Link> while you wait.
          </p>
        </div>
      ) : (
        <ul className="grid gap-4 md:grid-cols-2">
          {classes.map((c) => (
            <li key={c.id}>
              <ClassCard summary={c} />
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
