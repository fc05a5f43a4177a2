import type { MDXComponents } from "mdx/types";
import type { ComponentProps } from "react";
import { Caution, Figure, H2, H3, Note, Practice } from "@/components/lessons/blocks";
import {
  LessonCutListCalculator,
  LessonEvenSpacingCalculator,
  LessonFractionBench,
  LessonGuardSpacingCalculator,
  LessonStairCalculator,
  LessonTapeReading,
  LessonWallGridCalculator,
} from "@/components/lessons/lesson-calculators";
import { WorkedExample } from "@/components/lessons/worked-example";

// Calculators come through lesson-calculators.tsx so that a lesson loads only the ones it shows.
const components: MDXComponents = {
  h2: H2,
  h3: H3,
  table: (props: ComponentProps<"table">) => (
    <div className="my-6 overflow-x-auto rounded-lg border border-rule">
      <table className="w-full text-left text-sm [&_td]:border-t [&_td]:border-rule [&_td]:px-3 [&_td]:py-2 [&_th]:bg-paper-sunk [&_th]:px-3 [&_th]:py-2" {...props} />
    </div>
  ),
  code: (props: ComponentProps<"code">) => <code className="rounded-sm bg-paper-sunk px-1" {...props} />,
  img: (props: ComponentProps<"img">) => (
    // eslint-disable-next-line @next/next/no-img-element -- lesson images are small local files with their own alt text
    <img className="my-4 h-auto max-w-full rounded" alt={props.alt ?? ""} {...props} />
  ),
  Caution,
  Note,
  Figure,
  Practice,
  WorkedExample,
  TapeReading: LessonTapeReading,
  FractionBench: LessonFractionBench,
  EvenSpacingCalculator: LessonEvenSpacingCalculator,
  WallGridCalculator: LessonWallGridCalculator,
  CutListCalculator: LessonCutListCalculator,
  GuardSpacingCalculator: LessonGuardSpacingCalculator,
  StairCalculator: LessonStairCalculator,
};

export function useMDXComponents(): MDXComponents {
  return components;
}
