import type { Metadata } from "next";
import Link from "next/link";
import { ClassCard } from "@/components/classes/class-card";
import { JoinClassForm } from "@/components/classes/join-class-form";
import { requireUser } from "@/lib/auth/session";
import { listStudentClasses } from "@/lib/classes/queries";

export const metadata: Metadata = { title: "My classes" };

export default async function MyClassesPage({ searchParams }: PageProps<"/my-classes">) {
  const user = await requireUser();
  const [classes, search] = await Promise.all([listStudentClasses(user), searchParams]);
  const code = typeof search.code === "string" ? search.code.slice(0, 20) : "";
  return (
    <div className="space-y-8">
      <header className="space-y-1">
        <h1 className="text-2xl">My classes</h1>
        <p className="text-ink-soft">The classes you are enrolled in, with their assignments.</p>
      </header>
      {classes.length === 0 ? (
        <div className="card space-y-2 p-6">
          <p className="font-semibold">You are not in a class.</p>
          <p className="text-ink-soft">
            That is fine for learning on your own. If you are taking a course, enter the join code your instructor shows, or open the invitation they
            e-mailed you.
          </p>
          <p>
            <Link href="/safety">Read the shop safety notes</Link> while you wait.
          </p>
        </div>
      ) : (
        <ul className="grid gap-4 md:grid-cols-2">
          {classes.map((c) => (
            <li key={c.id}>
              <ClassCard summary={c} href={`/my-classes/${c.id}`} />
            </li>
          ))}
        </ul>
      )}
      {user.role === "student" ? (
        <section aria-labelledby="join-heading" className="card max-w-prose space-y-3 p-5">
          <h2 id="join-heading" className="text-xl">
            Join a class
          </h2>
          <JoinClassForm initialCode={code} />
        </section>
      ) : null}
    </div>
  );
}
