import type { MDXComponents } from "mdx/types";
import type { ComponentProps } from "react";
import { CutListCalculator } from "@/components/calculators/cut-list-calculator";
import { EvenSpacingCalculator } from "@/components/calculators/even-spacing-calculator";
import { FractionBench } from "@/components/calculators/fraction-bench";
import { GuardSpacingCalculator } from "@/components/calculators/guard-spacing-calculator";
import { StairCalculator } from "@/components/calculators/stair-calculator";
import { TapeReading } from "@/components/calculators/tape-reading";
import { WallGridCalculator } from "@/components/calculators/wall-grid-calculator";
import { Caution, Figure, H2, H3, Note, Practice } from "@/components/lessons/blocks";
import { WorkedExample } from "@/components/lessons/worked-example";

// Calculators in a lesson run compact and keep their state to themselves (several share a page).
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
  TapeReading: (props: ComponentProps<typeof TapeReading>) => <TapeReading compact {...props} />,
  EvenSpacingCalculator: (props: ComponentProps<typeof EvenSpacingCalculator>) => <EvenSpacingCalculator compact {...props} />,
  WallGridCalculator: (props: ComponentProps<typeof WallGridCalculator>) => <WallGridCalculator compact {...props} />,
  CutListCalculator: (props: ComponentProps<typeof CutListCalculator>) => <CutListCalculator compact {...props} />,
  GuardSpacingCalculator: (props: ComponentProps<typeof GuardSpacingCalculator>) => <GuardSpacingCalculator compact {...props} />,
  StairCalculator: (props: ComponentProps<typeof StairCalculator>) => <StairCalculator compact {...props} />,
  FractionBench: (props: ComponentProps<typeof FractionBench>) => <FractionBench compact {...props} />,
};

export function useMDXComponents(): MDXComponents {
  return components;
}
