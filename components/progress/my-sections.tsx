import Link from "next/link";
import { DataTable, cell, measureCell, rowLine } from "@/components/calculators/data-table";
import { LateFlag, StudentStatusBadge } from "@/components/assignments/student-status-badge";
import { LocalTime } from "@/components/ui/local-time";
import type { MyClassScores, MySlip } from "@/lib/progress/my-progress";
import type { SkillMastery } from "@/lib/practice/skills";
import { ChartPanel } from "./chart-panel";
import { RowChart } from "./lazy-charts";

export function MyClassPanel({ scores }: { scores: MyClassScores }) {
  const id = `class-${scores.id}`;
  const best = [...scores.assignments].sort((a, b) => b.percent - a.percent)[0];
  const summary =
    scores.assignments.length === 0
      ? `${scores.name}: no published assignments yet.`
      : `${scores.name}: your average is ${scores.average} % over ${scores.assignments.length} assignment${scores.assignments.length === 1 ? "" : "s"}.${best && best.percent > 0 ? ` Best: ${best.title}, ${best.percent} %.` : ""}`;
  return (
    <ChartPanel
      id={id}
      heading={scores.name}
      summary={summary}
      empty={scores.assignments.length === 0}
      chart={<RowChart id={id} max={100} data={scores.assignments.map((a) => ({ title: a.title, percent: a.percent }))} category="title" series={[{ key: "percent", label: "Score (%)" }]} />}
      table={
        <DataTable caption={`Your scores in ${scores.name}`} columns={["Assignment", "Due", "Points", "Score", "Standing"]}>
          {scores.assignments.map((a) => (
            <tr key={a.id} className={rowLine}>
              <th scope="row" className={`${cell} font-semibold`}>
                <Link href={`/my-classes/${scores.id}/assignments/${a.id}`}>{a.title}</Link>
              </th>
              <td className={cell}>
                <LocalTime iso={a.dueAt} style="date" />
              </td>
              <td className={measureCell}>
                {a.earned} / {a.possible}
              </td>
              <td className={measureCell}>{a.percent} %</td>
              <td className={cell}>
                <StudentStatusBadge status={a.status} /> {a.late ? <LateFlag /> : null}
              </td>
            </tr>
          ))}
        </DataTable>
      }
    />
  );
}

export function MyMasteryPanel({ mastery }: { mastery: SkillMastery[] }) {
  const mastered = mastery.filter((m) => m.mastered);
  const started = mastery.filter((m) => m.finished > 0);
  const summary =
    started.length === 0
      ? "You have not finished a problem yet. Practice problems and assignment problems both count."
      : `You have mastered ${mastered.length} of ${mastery.length} skills. Working on: ${mastery.filter((m) => !m.mastered && m.finished > 0).map((m) => `${m.title} (level ${m.currentLevel})`).join(", ") || "nothing open"}.`;
  return (
    <ChartPanel
      id="my-mastery"
      heading="Levels mastered per skill"
      summary={summary}
      empty={started.length === 0}
      chart={
        <RowChart id="my-mastery" max={3} data={mastery.map((m) => ({ title: m.title, levels: m.levels.filter((l) => l.mastered).length }))} category="title" series={[{ key: "levels", label: "Levels mastered" }]} />
      }
      table={
        <DataTable caption="Levels mastered per skill (4 of your last 5 right masters a level)" columns={["Skill", "Level 1", "Level 2", "Level 3"]}>
          {mastery.map((m) => (
            <tr key={m.skill} className={rowLine}>
              <th scope="row" className={`${cell} font-semibold`}>
                {m.title}
              </th>
              {m.levels.map((l) => (
                <td key={l.level} className={cell}>
                  {l.mastered ? "Mastered" : l.open ? `${l.solvedOfLastFive} of last ${Math.min(5, l.finished)} right` : "Not open yet"}
                </td>
              ))}
            </tr>
          ))}
        </DataTable>
      }
    />
  );
}

/** Each slip once, with what it means and the lesson section that teaches the point. */
export function MySlipsList({ slips }: { slips: MySlip[] }) {
  if (slips.length === 0) return <p className="card p-4 text-ink-soft">No slips yet. When the grader recognises a wrong answer, it is listed here with the lesson that covers it.</p>;
  return (
    <ul className="space-y-3" aria-label="Your most frequent slips">
      {slips.slice(0, 10).map((s) => (
        <li key={s.pattern} className="card space-y-1 p-4 text-sm" data-slip={s.pattern}>
          <p className="font-semibold">
            {s.name} <span className="measure text-ink-soft">× {s.count}</span>
          </p>
          <p>{s.feedback}</p>
          <p className="text-ink-soft">
            In problems: {s.kinds.join(", ")} · last on <LocalTime iso={s.lastAt} style="date" />
          </p>
          {s.lessonHref ? (
            <Link href={s.lessonHref} className="font-semibold">
              Read the lesson on {s.name.toLowerCase()}
            </Link>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
