import type { Metadata } from "next";
import { GuardSpacingCalculator } from "@/components/calculators/guard-spacing-calculator";
import { CalculatorPage } from "../calculator-page";

const title = "Guard spacing";
export const metadata: Metadata = { title };

export default function GuardSpacingPage({ searchParams }: PageProps<"/calculators/guard-spacing">) {
  return (
    <CalculatorPage
      title={title}
      calculator={GuardSpacingCalculator}
      searchParams={searchParams}
      intro={
        <>
          Balusters between two posts, with an opening at each end: find the fewest balusters that keep <strong>every opening under the
          limit</strong>, then divide the free space by the spaces — one more than the balusters. An opening of exactly 4″ lets a 4″ sphere
          through, so it fails.
        </>
      }
    />
  );
}
