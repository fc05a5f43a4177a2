import type { Metadata } from "next";
import Link from "next/link";
import { MasteryMeter } from "@/components/practice/mastery-meter";
import { PracticeHistoryTable } from "@/components/practice/history-table";
import { StartButton } from "@/components/practice/start-button";
import { getCurrentUser } from "@/lib/auth/session";
import { masteryFor, practiceHistory } from "@/lib/practice/history";
import { historyQuerySchema } from "@/lib/practice/schemas";
import { MASTERY_NEEDED, MASTERY_WINDOW } from "@/lib/practice/skills";
import { PROBLEM_KINDS } from "@/lib/problems";

export const metadata: Metadata = { title: "Practice" };

export default async function PracticePage({ searchParams }: PageProps<"/practice">) {
  const user = await getCurrentUser();
  const mastery = await masteryFor(user);
  const query = historyQuerySchema.safeParse(await searchParams);
  const history = user ? await practiceHistory(user, query.success ? query.data.page : 1) : null;
  const canPreviewAll = user !== null && user.role !== "student";

  return (
    <div className="space-y-8">
      <header className="max-w-prose space-y-3">
        <h1 className="text-2xl">Practice</h1>
        <p className="text-ink-soft">
          Every problem has its own numbers. Type answers the way you read a tape — <span className="measure">22 3/4</span>,{" "}
          <span className="measure">1&apos; 10 3/4&quot;</span> — and you get three tries. A wrong answer names the slip; the worked
          solution shows once the problem is finished. Solve {MASTERY_NEEDED} of your last {MASTERY_WINDOW} at a level to master it and open the next.
        </p>
        <div className="flex flex-wrap items-center gap-3">
          <StartButton request={{ next: true }} className="btn-primary">
            {user ? "Next problem (your weakest skill)" : "Give me a problem"}
          </StartButton>
        </div>
        {user ? null : (
          <p className="rounded border-l-4 border-chalk bg-chalk-light/60 p-3 text-sm">
            You can practise without an account, but nothing is kept. <Link href="/signup?callbackUrl=/practice">Sign up</Link> to keep your
            progress and unlock levels as you master them.
          </p>
        )}
      </header>

      <section aria-labelledby="skills" className="space-y-4">
        <h2 id="skills" className="text-xl">
          Skills
        </h2>
        <ul className="grid gap-4 lg:grid-cols-2">
          {mastery.map((skill) => (
            <li key={skill.skill} className="card space-y-3 p-4" data-skill={skill.skill}>
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <h3 className="text-lg">{skill.title}</h3>
                {user ? <MasteryMeter skill={skill} /> : null}
              </div>
              <ul className="space-y-3">
                {PROBLEM_KINDS.filter((k) => k.skill === skill.skill).map((kind) => (
                  <li key={kind.key} className="space-y-2 border-t border-rule pt-3">
                    <p>
                      <span className="font-semibold">{kind.title}</span> — <span className="text-ink-soft">{kind.summary}</span>
                    </p>
                    <div className="flex flex-wrap gap-2" role="group" aria-label={`Start ${kind.title}`}>
                      {kind.levels.map((level) => {
                        const open = !user || canPreviewAll || skill.levels[level.level - 1].open;
                        return (
                          <StartButton key={level.level} request={{ kind: kind.key, level: level.level }} disabled={!open}>
                            <span>
                              Level {level.level}: {level.label}
                              {open ? "" : " (locked)"}
                            </span>
                          </StartButton>
                        );
                      })}
                    </div>
                  </li>
                ))}
              </ul>
            </li>
          ))}
        </ul>
      </section>

      {history ? <PracticeHistoryTable history={history} /> : null}
    </div>
  );
}
