// A short cut list from one stock length with a kerf: how many of the longest piece one board
// yields, the offcut left, and how many boards to buy. The longest piece is drawn so that it
// would fit once more if the saw took no wood, which makes a forgotten kerf show in every part.
import { cutList, Fraction, type CutListResult, type CutPiece } from "@/lib/layout";
import { inchTex, inchText, precisionFor, roundedAnswer } from "./kit";
import type { ErrorPattern } from "./patterns";
import { createRandom } from "./random";
import { diagnoseWith, drawUntil, levelInfo, slipsAreClear, type Slip, type SlipModel } from "./stock-figures";
import type { Level, ProblemKind } from "./types";

export type StockBoardsParams = {
  level: Level;
  stockFeet: number;
  kerf: Fraction;
  /** Longest first; total quantity at most 30, so the engine's plan is the proven best. */
  pieces: CutPiece[];
};

const LABELS = ["rail", "stile", "cleat"];
const STOCK: Record<Level, readonly number[]> = { 1: [8, 10], 2: [8, 10, 12], 3: [8, 10, 12, 16] };

const style = (level: Level) => (level === 3 ? "feet-inches" : "inches");
const stockLength = (p: StockBoardsParams) => new Fraction(p.stockFeet * 12);

/** The most of one piece a board holds: the largest quantity the engine still fits on one board. */
function mostPerBoard(piece: Fraction, stock: Fraction, kerf: Fraction): { count: number; plan: CutListResult } {
  let best: { count: number; plan: CutListResult } | null = null;
  for (let count = 1; ; count++) {
    const plan = cutList({ pieces: [{ label: "piece", length: piece, quantity: count }], stock: [{ length: stock }], kerf });
    if (plan.boardCount !== 1) break;
    best = { count, plan };
  }
  if (!best) throw new RangeError("the piece is longer than the stock");
  return best;
}

// Parameters are never changed after they are drawn, so results can be kept per object.
const plans = new WeakMap<StockBoardsParams, ReturnType<typeof compute>>();

function compute(p: StockBoardsParams) {
  const stock = stockLength(p);
  const longest = p.pieces[0].length;
  const most = mostPerBoard(longest, stock, p.kerf);
  const all = cutList({ pieces: p.pieces, stock: [{ length: stock }], kerf: p.kerf });
  return { stock, longest, perBoard: most.count, offcut: most.plan.boards[0].offcut, all };
}

function solved(p: StockBoardsParams) {
  let s = plans.get(p);
  if (!s) {
    s = compute(p);
    plans.set(p, s);
  }
  return s;
}

// Diagnosis asks for the same plans many times over; each is a packing search.
const slipCache = new WeakMap<StockBoardsParams, Record<string, Slip[]>>();

const model: SlipModel<StockBoardsParams> = {
  parts: (p) => [
    { key: "perBoard", label: `${cap(p.pieces[0].label)}s from one board`, answer: "count", precision: 1 },
    { key: "offcut", label: "Offcut on that board", answer: "length", precision: precisionFor(p.level), style: style(p.level) },
    { key: "boards", label: "Boards to buy", answer: "count", precision: 1 },
  ],
  solve: (p) => {
    const s = solved(p);
    return { perBoard: new Fraction(s.perBoard), offcut: s.offcut, boards: new Fraction(s.all.boardCount) };
  },
  slips: (p) => {
    const known = slipCache.get(p);
    if (known) return known;
    const s = solved(p);
    const kerfless = mostPerBoard(s.longest, s.stock, new Fraction(0)).count;
    const noKerfPlan = cutList({ pieces: p.pieces, stock: [{ length: s.stock }], kerf: new Fraction(0) });
    const pieces = s.longest.mul(s.perBoard);
    const slips: Record<string, Slip[]> = {
      perBoard: [{ pattern: "forgot-kerf", value: new Fraction(kerfless) }],
      offcut: [
        { pattern: "forgot-kerf", value: s.stock.sub(pieces) },
        // The kerfs between pieces, but not the cut that parts the offcut off.
        { pattern: "forgot-kerf", value: s.stock.sub(pieces).sub(p.kerf.mul(s.perBoard - 1)) },
      ],
      boards: [{ pattern: "forgot-kerf", value: new Fraction(noKerfPlan.boardCount) }],
    };
    slipCache.set(p, slips);
    return slips;
  },
};

function cap(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

function generate(seed: number, level: Level): StockBoardsParams {
  const random = createRandom(seed);
  const precision = precisionFor(level);
  return drawUntil(
    () => {
      const stockFeet = random.pick(STOCK[level]);
      const stock = new Fraction(stockFeet * 12);
      // Level 1 stays on whole eighths, where 3/32 cannot be marked; above it, either blade.
      const kerf = level === 1 ? new Fraction(1, 8) : random.pick([new Fraction(1, 8), new Fraction(3, 32)]);
      const n = random.int(3, 6);
      // n pieces fit with no kerf, n − 1 kerfs more do not: n·len ≤ L < n·len + (n − 1)·kerf.
      const slack = Number(kerf.mul(n - 1).div(n).mul(precision).ceil().valueOf()) - 1;
      const longest = stock.div(n).mul(precision).floor().sub(random.int(0, Math.max(0, slack))).div(precision);
      if (longest.mul(n).add(kerf.mul(n - 1)).compare(stock) <= 0) return null;
      const shorterCount = level === 1 ? 1 : random.int(1, 2);
      const pieces: CutPiece[] = [{ label: LABELS[0], length: longest, quantity: random.int(2, 8) }];
      const unit = level === 1 ? 1 : precision;
      for (let i = 0; i < shorterCount; i++) {
        const length = new Fraction(random.int(8 * unit, longest.sub(4).mul(unit).floor().valueOf()), unit);
        if (pieces.some((x) => x.length.equals(length))) return null;
        pieces.push({ label: LABELS[i + 1], length, quantity: random.int(2, level === 3 ? 10 : 6) });
      }
      pieces.sort((a, b) => b.length.compare(a.length));
      return pieces.reduce((t, x) => t + x.quantity, 0) <= 30 ? { level, stockFeet, kerf, pieces } : null;
    },
    (p) => {
      const s = solved(p);
      const offcut = roundedAnswer(s.offcut, precision);
      // An offcut that reads as one of the listed pieces would put the answer in the prompt.
      if (!s.all.optimal || s.offcut.compare(0) <= 0 || p.pieces.some((x) => x.length.equals(offcut))) return false;
      return slipsAreClear(model, p);
    },
    "stock-boards",
  );
}

const pieceTex = (p: StockBoardsParams, length: Fraction) => (p.level === 3 ? inchText(length, "feet-inches") : `$${inchTex(length)}$`);

export const stockBoards: ProblemKind<StockBoardsParams> = {
  key: "stock-boards",
  skill: "cut-list",
  title: "Boards to buy for a cut list",
  summary: "Fit pieces onto stock boards with the saw's kerf: pieces per board, the offcut, and boards to buy.",
  levels: levelInfo([
    "Two piece lengths in whole inches from 8' or 10' stock, a 1/8\" kerf; lengths to 1/8\".",
    "Two or three lengths to 1/16\", a 1/8\" or 3/32\" kerf; lengths to 1/16\".",
    "Three lengths in feet and inches to 1/32\", stock up to 16'; lengths to 1/32\".",
  ]),
  lesson: { slug: "cut-lists-and-stock", section: "kerf-the-wood-the-saw-turns-to-dust" },
  generate,
  render(p) {
    const list = p.pieces.map((x) => `${x.quantity} ${x.label}s at ${pieceTex(p, x.length)}`).join(", ");
    const longest = p.pieces[0];
    return {
      text: [
        `The cut list calls for ${list}. They all come from ${p.stockFeet}' boards, and the saw's kerf is $${inchTex(p.kerf)}$.`,
        "Every cut takes one kerf, including the cut that parts the offcut off a board. The factory ends are square, so nothing is trimmed first.",
        `How many ${longest.label}s can one board yield, and what offcut is left on a board cut into that many ${longest.label}s? How many boards do you buy for the whole list?`,
      ].join("\n\n"),
    };
  },
  parts: model.parts,
  solve: model.solve,
  diagnose: (p, part, answer): ErrorPattern | null => diagnoseWith(model, p, part, answer),
  explain(p) {
    const s = solved(p);
    const precision = precisionFor(p.level);
    const n = s.perBoard;
    const fits = (count: number) => `$${count} \\times ${inchTex(s.longest)} + ${count - 1} \\times ${inchTex(p.kerf)} = ${inchTex(s.longest.mul(count).add(p.kerf.mul(count - 1)))}$`;
    const describe = (board: CutListResult["boards"][number]) => {
      const counts = new Map<string, { length: Fraction; count: number }>();
      for (const cut of board.cuts) counts.set(cut.label, { length: cut.length, count: (counts.get(cut.label)?.count ?? 0) + 1 });
      return [...counts.entries()].map(([label, c]) => `${c.count} ${label}${c.count > 1 ? "s" : ""}`).join(" and ");
    };
    const boards = s.all.boards.map((b, i) => `board ${i + 1}: ${describe(b)}`).join("; ");
    return [
      `Each ${p.stockFeet}' board is $${inchTex(s.stock)}$. On one board, $k$ pieces need $k$ lengths and $k - 1$ kerfs between them.`,
      `${cap(p.pieces[0].label)}s: ${fits(n + 1)}, longer than the board; ${fits(n)}, which fits. One board yields ${n}.`,
      `Offcut: ${n} ${p.pieces[0].label}s and ${n} kerfs (the last one parts the offcut off): $${inchTex(s.stock)} - ${n} \\times ${inchTex(s.longest)} - ${n} \\times ${inchTex(p.kerf)} = ${inchTex(s.offcut)}$.`,
      `Place the longest pieces first and fill each board's leftover with shorter ones: ${boards}.`,
      `${n} ${p.pieces[0].label}s per board, offcut ${inchText(roundedAnswer(s.offcut, precision), style(p.level))}, ${s.all.boardCount} boards to buy.`,
    ];
  },
};

export const STOCK_BOARDS_MODEL = model;
