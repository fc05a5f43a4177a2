import type { Metadata } from "next";
import { StairCalculator } from "@/components/calculators/stair-calculator";
import { CalculatorPage } from "../calculator-page";

const title = "Stair layout";
export const metadata: Metadata = { title };

export default function StairLayoutPage({ searchParams }: PageProps<"/calculators/stairs">) {
  return (
    <CalculatorPage
      title={title}
      calculator={StairCalculator}
      searchParams={searchParams}
      intro={
        <>
          Divide the <strong>total rise</strong> — finished floor to finished floor — into equal risers no taller than the limit. There is one
          tread fewer than risers, because the upper floor is the last step; the treads times their depth is the total run.
        </>
      }
    />
  );
}
