// The calculator catalogue: one entry per calculator page. Saved layouts name their kind from here.
export const CALCULATORS = [
  {
    kind: "even-spacing",
    title: "Even spacing",
    summary: "Members across a span with equal gaps: count or a maximum gap, flush at the ends or between posts.",
  },
  {
    kind: "wall-grid",
    title: "Wall grid",
    summary: "Board-and-batten or grid wall: rails, base trim, verticals, rows — every cut, every mark, and which land on studs.",
  },
  {
    kind: "cut-list",
    title: "Cut list",
    summary: "Pieces and stock lengths with the saw's kerf: boards to buy, which cuts come from which board, offcuts and waste.",
  },
  {
    kind: "guard-spacing",
    title: "Guard spacing",
    summary: "Balusters between posts so no opening passes a 4\u2033 sphere.",
  },
  {
    kind: "stairs",
    title: "Stair layout",
    summary: "Total rise to risers, treads, total run and stringer length, checked against the residential code limits.",
  },
  {
    kind: "fraction-bench",
    title: "Fraction bench",
    summary: "Add, subtract, multiply and divide measurements; convert decimals to sixteenths; read a tape measure.",
  },
] as const;

export type CalculatorKind = (typeof CALCULATORS)[number]["kind"];
export const CALCULATOR_KINDS = CALCULATORS.map((c) => c.kind) as [CalculatorKind, ...CalculatorKind[]];

export function calculatorPath(kind: CalculatorKind, params?: string): string {
  return `/calculators/${kind}${params ? `?${params}` : ""}`;
}

export function calculatorTitle(kind: CalculatorKind): string {
  return CALCULATORS.find((c) => c.kind === kind)?.title ?? kind;
}
