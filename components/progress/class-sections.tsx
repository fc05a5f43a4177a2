import Link from "next/link";
import { DataTable, cell, measureCell, rowLine } from "@/components/calculators/data-table";
import type { AssignmentDistribution, ClassSlip, LessonCompletion, SkillProgress } from "@/lib/progress/class-progress";
import { activitySummary, distributionSummary, lessonSummary, masterySummary, slipSummary } from "@/lib/progress/summaries";
import { ChartPanel } from "./chart-panel";
import { ColumnChart, RowChart } from "./lazy-charts";

const TOP_SLIPS = 8;

/** The "what do I re-teach tomorrow" view: the slips made most, by whom, with the lesson that fixes each. */
export function SlipsSection({ slips }: { slips: ClassSlip[] }) {
  const top = slips.slice(0, TOP_SLIPS);
  return (
    <ChartPanel
      id="slips"
      heading="Slips to re-teach"
      summary={slipSummary(slips.map((s) => ({ name: s.name, count: s.count, students: s.students.length })))}
      empty={slips.length === 0}
      chart={<RowChart id="slips" data={top.map((s) => ({ name: s.name, count: s.count }))} category="name" series={[{ key: "count", label: "Times" }]} />}
      table={
        <DataTable caption="Slips by how often they were made" columns={["Slip", "Times", "Students", "In problems", "Lesson"]}>
          {slips.map((s) => (
            <tr key={s.pattern} className={rowLine}>
              <th scope="row" className={`${cell} font-semibold`}>
                {s.name}
              </th>
              <td className={measureCell}>{s.count}</td>
              <td className={cell}>{s.students.map((st) => `${st.name} (${st.count})`).join(", ")}</td>
              <td className={cell}>{s.kinds.map((k) => `${k.title} (${k.count})`).join(", ")}</td>
              <td className={cell}>{s.lessonHref ? <Link href={s.lessonHref}>Lesson section</Link> : "—"}</td>
            </tr>
          ))}
        </DataTable>
      }
    />
  );
}

/** The first few slips spelled out as cards an instructor can plan tomorrow's demonstration from. */
export function ReteachList({ slips }: { slips: ClassSlip[] }) {
  if (slips.length === 0) return null;
  return (
    <ol className="grid gap-3 md:grid-cols-3">
      {slips.slice(0, 3).map((s, i) => (
        <li key={s.pattern} className="card space-y-1 border-l-4 border-l-chalk p-4 text-sm">
          <p className="font-semibold">
            <span className="measure text-ink-faint">{i + 1}.</span> {s.name} <span className="measure">× {s.count}</span>
          </p>
          <p className="text-ink-soft">
            {s.students.length} student{s.students.length === 1 ? "" : "s"}: {s.students.slice(0, 6).map((st) => st.name).join(", ")}
            {s.students.length > 6 ? ` and ${s.students.length - 6} more` : ""}
          </p>
          <p className="text-ink-soft">In: {s.kinds.map((k) => k.title).join(", ")}</p>
          {s.lessonHref ? <Link href={s.lessonHref}>Open the lesson section</Link> : null}
        </li>
      ))}
    </ol>
  );
}

export function DistributionPanel({ assignment, classId }: { assignment: AssignmentDistribution; classId: number }) {
  return (
    <ChartPanel
      id={`scores-${assignment.id}`}
      heading={assignment.title}
      summary={distributionSummary(assignment.title, assignment.percents)}
      empty={assignment.students === 0}
      chart={<ColumnChart data={assignment.buckets} x="label" y="students" yLabel="Students" />}
      table={
        <DataTable
          caption={
            <>
              Students by score, {assignment.title} (<Link href={`/classes/${classId}/assignments/${assignment.id}/students`}>each student</Link>)
            </>
          }
          columns={["Score (%)", "Students"]}
        >
          {assignment.buckets.map((b) => (
            <tr key={b.label} className={rowLine}>
              <th scope="row" className={`${measureCell} font-normal`}>
                {b.label}
              </th>
              <td className={measureCell}>{b.students}</td>
            </tr>
          ))}
        </DataTable>
      }
    />
  );
}

export function MasteryPanel({ skills, students }: { skills: SkillProgress[]; students: number }) {
  return (
    <ChartPanel
      id="mastery"
      heading="Mastery by skill"
      summary={masterySummary(
        skills.map((s) => ({ title: s.title, mastered: s.mastered, levelOne: s.levels[0].mastered })),
        students,
      )}
      empty={students === 0}
      chart={
        <RowChart
          id="mastery"
          max={students}
          data={skills.map((s) => ({ title: s.title, l1: s.levels[0].mastered, l2: s.levels[1].mastered, l3: s.levels[2].mastered }))}
          category="title"
          series={[
            { key: "l1", label: "Level 1" },
            { key: "l2", label: "Level 2" },
            { key: "l3", label: "Level 3 (skill mastered)" },
          ]}
        />
      }
      table={
        <DataTable caption={`Students who have mastered each level, of ${students}`} columns={["Skill", "Level 1", "Level 2", "Level 3"]}>
          {skills.map((s) => (
            <tr key={s.skill} className={rowLine}>
              <th scope="row" className={`${cell} font-semibold`}>
                {s.title}
              </th>
              {s.levels.map((l) => (
                <td key={l.level} className={measureCell}>
                  {l.mastered}
                </td>
              ))}
            </tr>
          ))}
        </DataTable>
      }
    />
  );
}

export function LessonsPanel({ lessons, students }: { lessons: LessonCompletion[]; students: number }) {
  return (
    <ChartPanel
      id="lessons"
      heading="Lessons read and practised"
      summary={lessonSummary(lessons, students)}
      empty={students === 0}
      chart={
        <RowChart
          id="lessons"
          max={students}
          data={lessons.map((l) => ({ title: l.title, read: l.read, practised: l.practised, mastered: l.mastered ?? 0 }))}
          category="title"
          series={[
            { key: "read", label: "Read" },
            { key: "practised", label: "Practised" },
            { key: "mastered", label: "Skill mastered" },
          ]}
        />
      }
      table={
        <DataTable caption={`Students per lesson, of ${students}`} columns={["Lesson", "Opened", "Read", "Practised", "Skill mastered"]}>
          {lessons.map((l) => (
            <tr key={l.slug} className={rowLine}>
              <th scope="row" className={`${cell} font-semibold`}>
                <Link href={`/lessons/${l.slug}`}>{l.title}</Link>
              </th>
              <td className={measureCell}>{l.opened}</td>
              <td className={measureCell}>{l.read}</td>
              <td className={measureCell}>{l.practised}</td>
              <td className={measureCell}>{l.mastered ?? "—"}</td>
            </tr>
          ))}
        </DataTable>
      }
    />
  );
}

export function ActivityPanel({ activity }: { activity: { day: string; tries: number }[] }) {
  const busy = activity.filter((d) => d.tries > 0);
  return (
    <ChartPanel
      id="activity"
      heading="Tries per day, last 8 weeks"
      summary={activitySummary(activity)}
      empty={busy.length === 0}
      chart={<ColumnChart data={activity.map((d) => ({ day: d.day.slice(5), tries: d.tries }))} x="day" y="tries" yLabel="Tries" />}
      table={
        <DataTable caption="Days with tries (UTC)" columns={["Day", "Tries"]}>
          {busy.map((d) => (
            <tr key={d.day} className={rowLine}>
              <th scope="row" className={`${measureCell} font-normal`}>
                {d.day}
              </th>
              <td className={measureCell}>{d.tries}</td>
            </tr>
          ))}
        </DataTable>
      }
    />
  );
}
