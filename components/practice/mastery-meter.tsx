import type { SkillMastery } from "@/lib/practice/skills";
import { MASTERY_NEEDED } from "@/lib/practice/skills";

/** Three pips, one per level: filled when mastered, outlined when open, dashed when locked. */
export function MasteryMeter({ skill }: { skill: SkillMastery }) {
  const current = skill.levels[skill.currentLevel - 1];
  const summary = skill.mastered
    ? "all three levels mastered"
    : current.finished === 0
      ? `level ${skill.currentLevel}: none finished yet`
      : `level ${skill.currentLevel}: ${current.solvedOfLastFive} of the last ${Math.min(5, current.finished)} solved (${MASTERY_NEEDED} of 5 masters it)`;
  return (
    <p className="flex items-center gap-2 text-sm text-ink-soft" data-mastery={skill.skill}>
      <span className="flex gap-1" aria-hidden="true">
        {skill.levels.map((l) => (
          <span
            key={l.level}
            className={`inline-block size-3.5 rounded-full border-2 ${l.mastered ? "border-ok bg-ok" : l.open ? "border-chalk" : "border-dashed border-rule-strong"}`}
          />
        ))}
      </span>
      <span>{summary}</span>
    </p>
  );
}
