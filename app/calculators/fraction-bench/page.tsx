import type { Metadata } from "next";
import { FractionBench } from "@/components/calculators/fraction-bench";
import { CalculatorPage } from "../calculator-page";

const title = "Fraction bench";
export const metadata: Metadata = { title };

export default function FractionBenchPage({ searchParams }: PageProps<"/calculators/fraction-bench">) {
  return (
    <CalculatorPage
      title={title}
      calculator={FractionBench}
      searchParams={searchParams}
      printIntro
      intro={
        <>
          The arithmetic behind every layout, done exactly: work a calculation on lengths, turn a calculator&apos;s decimal into the nearest
          sixteenth, see which graduation a length rounds to, and practise reading a tape.
        </>
      }
    />
  );
}
