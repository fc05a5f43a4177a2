"use client";

import dynamic from "next/dynamic";
import type { ComponentProps, ComponentType } from "react";
import type { CutListCalculator } from "@/components/calculators/cut-list-calculator";
import type { EvenSpacingCalculator } from "@/components/calculators/even-spacing-calculator";
import type { FractionBench } from "@/components/calculators/fraction-bench";
import type { GuardSpacingCalculator } from "@/components/calculators/guard-spacing-calculator";
import type { StairCalculator } from "@/components/calculators/stair-calculator";
import type { TapeReading } from "@/components/calculators/tape-reading";
import type { WallGridCalculator } from "@/components/calculators/wall-grid-calculator";

/*
 * mdx-components.tsx is shared by every lesson, so a calculator imported there statically lands in
 * every lesson's bundle. Behind next/dynamic each one is its own chunk, fetched only by a lesson
 * that renders it. Server rendering stays on and there is deliberately no `loading` fallback: with
 * one, next/dynamic adds a Suspense boundary and the prerendered page would carry the placeholder
 * in place, with the calculator streamed after it; without one the calculator is in the HTML where
 * it stands, and a move between lessons in the browser keeps the old page until the chunk is in.
 */

// A lesson's calculator is compact and keeps its state out of the address (several share a page).
function compact<C extends ComponentType<{ compact?: boolean }>>(Component: ComponentType<ComponentProps<C>>) {
  function Compact(props: ComponentProps<C>) {
    return <Component {...props} compact />;
  }
  return Compact;
}

export const LessonTapeReading = compact<typeof TapeReading>(
  dynamic(() => import("@/components/calculators/tape-reading").then((m) => m.TapeReading)),
);
export const LessonFractionBench = compact<typeof FractionBench>(
  dynamic(() => import("@/components/calculators/fraction-bench").then((m) => m.FractionBench)),
);
export const LessonEvenSpacingCalculator = compact<typeof EvenSpacingCalculator>(
  dynamic(() => import("@/components/calculators/even-spacing-calculator").then((m) => m.EvenSpacingCalculator)),
);
export const LessonWallGridCalculator = compact<typeof WallGridCalculator>(
  dynamic(() => import("@/components/calculators/wall-grid-calculator").then((m) => m.WallGridCalculator)),
);
export const LessonCutListCalculator = compact<typeof CutListCalculator>(
  dynamic(() => import("@/components/calculators/cut-list-calculator").then((m) => m.CutListCalculator)),
);
export const LessonGuardSpacingCalculator = compact<typeof GuardSpacingCalculator>(
  dynamic(() => import("@/components/calculators/guard-spacing-calculator").then((m) => m.GuardSpacingCalculator)),
);
export const LessonStairCalculator = compact<typeof StairCalculator>(
  dynamic(() => import("@/components/calculators/stair-calculator").then((m) => m.StairCalculator)),
);
