import type { Metadata } from "next";
import Link from "next/link";
import { MyClassPanel, MyMasteryPanel, MySlipsList } from "@/components/progress/my-sections";
import { requireUser } from "@/lib/auth/session";
import { myProgress } from "@/lib/progress/my-progress";

export const metadata: Metadata = { title: "My progress" };

export default async function MyProgressPage() {
  const user = await requireUser();
  const progress = await myProgress(user);
  return (
    <div className="space-y-8">
      <header className="space-y-1">
        <h1 className="text-2xl">My progress</h1>
        <p className="text-ink-soft">Your scores, the skills you have mastered, and the slips worth a second look.</p>
      </header>

      <section aria-labelledby="slips-heading" className="space-y-3">
        <h2 id="slips-heading" className="text-xl">
          Slips to work on
        </h2>
        <MySlipsList slips={progress.slips} />
      </section>

      <section aria-labelledby="classes-heading" className="space-y-3">
        <h2 id="classes-heading" className="text-xl">
          Scores
        </h2>
        {progress.classes.length === 0 ? (
          <p className="card p-4 text-ink-soft">
            You are not in a class yet. Join one with the code your instructor gives you from <Link href="/my-classes">My classes</Link>.
          </p>
        ) : (
          <div className="grid gap-4 lg:grid-cols-2">
            {progress.classes.map((c) => (
              <MyClassPanel key={c.id} scores={c} />
            ))}
          </div>
        )}
      </section>

      <section aria-labelledby="skills-heading" className="space-y-3">
        <h2 id="skills-heading" className="text-xl">
          Skills
        </h2>
        <MyMasteryPanel mastery={progress.mastery} />
        <p className="text-sm">
          <Link href="/practice">Practise the next problem</Link>
        </p>
      </section>
    </div>
  );
}
