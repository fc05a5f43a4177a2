// Speed of the layout engine, measured in one run so the figures are comparable: exact
// even spacing beside the same loop in plain floating point (what exactness costs), a
// 60-member wall grid, an exact 30-piece cut list and a 300-piece heuristic one. A
// calculator recomputes on every keystroke, so each realistic case is held against one
// 16 ms frame. It only prints; nothing here passes or fails.
//
//   npx tsx scripts/bench.ts
import { Fraction, roundTo } from "@/lib/layout/core";
import { cutList, type CutPiece } from "@/lib/layout/cut-list";
import { evenSpacing } from "@/lib/layout/spacing";
import { wallGrid } from "@/lib/layout/wall-grid";

const FRAME_MS = 16;
const WARM_UP_MS = 300;
const MEASURE_MS = 1500;

type Figure = { name: string; opsPerSecond: number; msPerOp: number };

function measure(name: string, run: () => unknown): Figure {
  let sink: unknown;
  const until = (ms: number) => {
    const start = performance.now();
    let ops = 0;
    let elapsed = 0;
    // Batches keep the clock reads from dominating fast cases.
    let batch = 1;
    while (elapsed < ms) {
      for (let i = 0; i < batch; i++) sink = run();
      ops += batch;
      elapsed = performance.now() - start;
      if (elapsed < ms / 10) batch *= 2;
    }
    return { ops, elapsed };
  };
  until(WARM_UP_MS);
  const { ops, elapsed } = until(MEASURE_MS);
  if (sink === undefined) throw new Error(`${name} returned nothing`);
  return { name, opsPerSecond: (ops / elapsed) * 1000, msPerOp: elapsed / ops };
}

const f = (value: number | string) => new Fraction(value);

// Even spacing, 1,000 members: a long run of pickets, marks to sixteenths.
const pickets = { span: f("9000.5"), memberWidth: f("3.5"), count: 1000, endCondition: "members" as const, denominator: 16 };

/** The same layout in doubles: gap, then each mark as a multiplication, rounded to 1/16. */
function evenSpacingFloat(span: number, width: number, count: number, denominator: number) {
  const gap = (span - width * count) / (count - 1);
  const onCenter = gap + width;
  const round = (x: number) => Math.round(x * denominator) / denominator;
  const members = new Array<{ start: number; center: number; end: number; startMark: number; centerMark: number; endMark: number }>(count);
  for (let i = 0; i < count; i++) {
    const start = i * onCenter;
    const center = start + width / 2;
    const end = start + width;
    members[i] = { start, center, end, startMark: round(start), centerMark: round(center), endMark: round(end) };
  }
  return { gap, onCenter, roundedGap: round(gap), members };
}

// A 60-member wall grid: a 50' wall of 1x4 battens (3 1/2", PS 20) with one row of rails.
const longWall = {
  wallWidth: f(600),
  wallHeight: f(108),
  topRailWidth: f("5.5"),
  bottomRailWidth: f("3.5"),
  baseTrimHeight: f(0),
  verticalWidth: f("3.5"),
  verticalCount: 60,
  rows: 1,
  studs: { firstStudCenter: f(16) },
  stock: [{ length: f(96) }, { length: f(120) }, { length: f(144) }],
  kerf: new Fraction(1, 8),
  denominator: 16,
};

// Trim for a room: casing, base and battens in lengths a carpenter would list.
function pieces(total: number): CutPiece[] {
  const lengths = ["83.25", "36.5", "22.75", "47.125", "60", "17.375", "71.5", "29.0625", "52.25", "12.5"];
  const list: CutPiece[] = [];
  for (let i = 0; i < total; i++) list.push({ label: `piece ${i + 1}`, length: f(lengths[i % lengths.length]).add(new Fraction(i % 7, 16)), quantity: 1 });
  return list;
}
const stock = [{ length: f(96) }, { length: f(120) }, { length: f(144) }];
const exactCutList = { pieces: pieces(30), stock, kerf: new Fraction(1, 8) };
const heuristicCutList = { pieces: pieces(300), stock, kerf: new Fraction(1, 8) };

const exactMethod = cutList(exactCutList).method;
const heuristicMethod = cutList(heuristicCutList).method;
const float = evenSpacingFloat(9000.5, 3.5, 1000, 16);
const exact = evenSpacing(pickets);
const differences = exact.members.filter((m, i) => !m.startMark.rounded.equals(roundTo(new Fraction(float.members[i].startMark), 16).rounded)).length;

const figures = {
  evenExact: measure("even spacing, 1,000 members (exact)", () => evenSpacing(pickets)),
  evenFloat: measure("even spacing, 1,000 members (float)", () => evenSpacingFloat(9000.5, 3.5, 1000, 16)),
  wall: measure("wall grid, 60 verticals, 1 row, studs, cut list", () => wallGrid(longWall)),
  cutExact: measure(`cut list, 30 pieces (${exactMethod})`, () => cutList(exactCutList)),
  cutHeuristic: measure(`cut list, 300 pieces (${heuristicMethod})`, () => cutList(heuristicCutList)),
};

const row = (figure: Figure, note = "") =>
  `${figure.name.padEnd(52)} ${figure.opsPerSecond.toFixed(figure.opsPerSecond < 100 ? 1 : 0).padStart(12)} ops/s ${figure.msPerOp.toFixed(3).padStart(10)} ms/op  ${note}`;
const frame = (figure: Figure) => (figure.msPerOp <= FRAME_MS ? "fits a 16 ms frame" : "over a 16 ms frame");

console.log(`Node ${process.version}, ${WARM_UP_MS} ms warm-up and ${MEASURE_MS} ms measured per case\n`);
console.log(row(figures.evenExact, frame(figures.evenExact)));
console.log(row(figures.evenFloat, "(plain doubles, for comparison)"));
console.log(`${"  exact ÷ float, time per layout".padEnd(52)} ${(figures.evenExact.msPerOp / figures.evenFloat.msPerOp).toFixed(1).padStart(12)} ×`);
console.log(`${"  marks where the float loop rounds differently".padEnd(52)} ${String(differences).padStart(12)} of 1,000`);
console.log(row(figures.wall, frame(figures.wall)));
console.log(row(figures.cutExact, frame(figures.cutExact)));
console.log(row(figures.cutHeuristic, frame(figures.cutHeuristic)));
