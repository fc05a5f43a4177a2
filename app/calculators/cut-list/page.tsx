import type { Metadata } from "next";
import { CutListCalculator } from "@/components/calculators/cut-list-calculator";
import { CalculatorPage } from "../calculator-page";

const title = "Cut list";
export const metadata: Metadata = { title };

export default function CutListPage({ searchParams }: PageProps<"/calculators/cut-list">) {
  return (
    <CalculatorPage
      title={title}
      calculator={CutListCalculator}
      searchParams={searchParams}
      intro={
        <>
          List the pieces and the stock lengths you can buy. Every saw cut turns a <strong>kerf</strong> of wood to dust, so four 24″ pieces do
          not come out of one 96″ board: the plan counts a kerf after every piece but the last, and shows what each board gives and the
          <strong> offcut</strong> left over.
        </>
      }
    />
  );
}
