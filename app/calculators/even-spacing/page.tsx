import type { Metadata } from "next";
import { EvenSpacingCalculator } from "@/components/calculators/even-spacing-calculator";
import { CalculatorPage } from "../calculator-page";

const title = "Even spacing";
export const metadata: Metadata = { title };

export default function EvenSpacingPage({ searchParams }: PageProps<"/calculators/even-spacing">) {
  return (
    <CalculatorPage
      title={title}
      calculator={EvenSpacingCalculator}
      searchParams={searchParams}
      printIntro
      intro={
        <>
          Take the members off the span and divide what is left by the number of <strong>spaces</strong> — one fewer than the members when a
          member sits at each end, one more when the layout runs between posts.
        </>
      }
    />
  );
}
