import type { Metadata } from "next";
import { WallGridCalculator } from "@/components/calculators/wall-grid-calculator";
import { CalculatorPage } from "../calculator-page";

const title = "Wall grid";
export const metadata: Metadata = { title };

export default function WallGridPage({ searchParams }: PageProps<"/calculators/wall-grid">) {
  return (
    <CalculatorPage
      title={title}
      calculator={WallGridCalculator}
      searchParams={searchParams}
      intro={
        <>
          A board-and-batten or grid wall. The rails run the full width; the <strong>verticals</strong> are cut to the height left between them
          and spaced so every <strong>bay</strong> is equal, and each row rail is cut to the bay. Every mark is measured from the left end of the
          wall and from the floor.
        </>
      }
    />
  );
}
