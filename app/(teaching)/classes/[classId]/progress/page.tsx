import type { Metadata } from "next";
import Link from "next/link";
import { ActivityPanel, DistributionPanel, LessonsPanel, MasteryPanel, ReteachList, SlipsSection } from "@/components/progress/class-sections";
import { requireRole } from "@/lib/auth/session";
import { classProgress } from "@/lib/progress/class-progress";
import { classIdOf, orPage } from "../load-class";

export const metadata: Metadata = { title: "Class progress" };

export default async function ClassProgressPage({ params }: PageProps<"/classes/[classId]/progress">) {
  const user = await requireRole("instructor", "admin");
  const classId = classIdOf((await params).classId);
  const progress = await orPage(() => classProgress(user, classId));
  const { summary, students } = progress;
  const base = `/classes/${classId}`;

  return (
    <div className="space-y-8">
      <div className="space-y-1">
        <nav aria-label="Breadcrumb" className="text-sm" data-chrome>
          <Link href="/classes">Classes</Link> <span aria-hidden="true">/</span> <Link href={base}>{summary.name}</Link> <span aria-hidden="true">/</span> <span>Progress</span>
        </nav>
        <h1 className="text-2xl">Class progress</h1>
        <p className="text-ink-soft">
          {summary.name} · {summary.term} · {students} active student{students === 1 ? "" : "s"}
        </p>
      </div>

      {students === 0 ? (
        <p className="card p-4">
          Nobody is in this class yet, so there is no progress to show. <Link href={`${base}/add-students`}>Add students</Link> and their work will appear here.
        </p>
      ) : (
        <>
          <section aria-labelledby="reteach-heading" className="space-y-3">
            <h2 id="reteach-heading" className="text-xl">
              What to re-teach
            </h2>
            <ReteachList slips={progress.slips} />
            <SlipsSection slips={progress.slips} />
          </section>

          <section aria-labelledby="scores-heading" className="space-y-3">
            <h2 id="scores-heading" className="text-xl">
              Scores by assignment
            </h2>
            {progress.assignments.length === 0 ? (
              <p className="card p-4 text-ink-soft">
                No published assignments yet. <Link href={`${base}/assignments`}>Build and publish one</Link> to see how the class scores.
              </p>
            ) : (
              <div className="grid gap-4 lg:grid-cols-2">
                {progress.assignments.map((a) => (
                  <DistributionPanel key={a.id} assignment={a} classId={classId} />
                ))}
              </div>
            )}
          </section>

          <section aria-labelledby="skills-heading" className="space-y-3">
            <h2 id="skills-heading" className="text-xl">
              Skills and lessons
            </h2>
            <div className="grid gap-4 lg:grid-cols-2">
              <MasteryPanel skills={progress.skills} students={students} />
              <LessonsPanel lessons={progress.lessons} students={students} />
            </div>
          </section>

          <section aria-labelledby="activity-heading" className="space-y-3">
            <h2 id="activity-heading" className="text-xl">
              Activity
            </h2>
            <ActivityPanel activity={progress.activity} />
          </section>
        </>
      )}
    </div>
  );
}
