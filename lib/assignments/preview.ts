import "server-only";
import crypto from "node:crypto";
import { AppError } from "@/lib/errors";
import { findKind, type Level, type ProblemFigure } from "@/lib/problems";
import { MAX_SEED } from "@/lib/problems/random";
import { inlineMathToHtml, mathTextToHtml, partView } from "@/lib/practice/present";
import { SKILL_TITLES } from "@/lib/practice/skills";
import { expectedText, workOut } from "@/lib/practice/view";
import type { z } from "zod";
import type { previewSchema } from "./teacher-schemas";
import { toleranceText } from "./teacher-format";

// One sample of an item for the instructor building it — answers included, which is why only
// instructors reach it. The seed comes from the kind, level and a sample counter, in a space
// apart from students' seeds (those are keyed with the app secret), so a sample is never
// someone's homework.

export type PreviewPart = { key: string; label: string; hint: string; accepts: string; expected: string };

export type SamplePreview = {
  kind: string;
  title: string;
  skillTitle: string;
  level: Level;
  levelLabel: string;
  levelDescription: string;
  sample: number;
  promptHtml: string;
  figure: ProblemFigure | null;
  parts: PreviewPart[];
  stepsHtml: string[];
};

export function previewSeed(kind: string, level: number, sample: number): number {
  const digest = crypto.createHash("sha256").update(`assignment-preview:${kind}:${level}:${sample}`).digest();
  return digest.readUInt32BE(0) % (MAX_SEED + 1);
}

export function previewSample(input: z.output<typeof previewSchema>): SamplePreview {
  const kind = findKind(input.kind);
  if (!kind) throw new AppError("bad_request", "Choose a problem kind from the list.", { kind: "Choose a problem kind from the list." });
  const level = input.level as Level;
  const info = kind.levels.find((l) => l.level === level);
  if (!info) throw new AppError("bad_request", "That level does not exist for this kind.", { level: "That level does not exist for this kind." });
  const work = workOut({ kind: kind.key, level, seed: previewSeed(kind.key, level, input.sample) });
  const prompt = kind.render(work.params);
  return {
    kind: kind.key,
    title: kind.title,
    skillTitle: SKILL_TITLES[kind.skill],
    level,
    levelLabel: info.label,
    levelDescription: info.description,
    sample: input.sample,
    promptHtml: mathTextToHtml(prompt.text),
    figure: prompt.figure ?? null,
    parts: work.parts.map((part) => ({
      key: part.key,
      label: part.label,
      hint: partView(part).hint,
      accepts: toleranceText(part, input.tolerance),
      expected: expectedText(part, work.expected[part.key]),
    })),
    stepsHtml: kind.explain(work.params).map(inlineMathToHtml),
  };
}
