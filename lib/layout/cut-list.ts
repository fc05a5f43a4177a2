// The cut list: the pieces a job needs → the stock boards to buy and which cuts come from
// which board. Lengths are exact Fractions of an inch; for the search they are scaled to
// integers by the common denominator of every length given, so no float decides a fit.
import { Fraction, ZERO, fromMillimetres, gt, lte, sum, toMillimetres, toNumber, type Length, type Unit, type Warning } from "./core";
import { bestPossible, exactPacking, lowerBoundL2 } from "./cut-list-exact";
import { StockChooser, compareScores, heuristicPacking, scorePacking, type Packing, type StockOption } from "./cut-list-heuristic";
import { exactFromNumber, formatMeasure } from "./measure";

export type CutPiece = { label: string; length: Fraction; quantity: number };
export type StockLength = { length: Fraction; price?: number; label?: string };

/**
 * The kerf model. `trim` comes off each board's factory end first (it is the whole
 * allowance, that cut's kerf included), leaving the usable length. Pieces are then cut one
 * after another from the trimmed end, longest first, each cut taking one kerf after its
 * piece. The last piece needs no kerf when it ends exactly at the board's end, so a board
 * holds pieces p1…pn when
 *   p1 + … + pn + kerf × (n − 1) ≤ usable length.
 * Whatever is left past the last piece is parted off by one more cut: its kerf comes out
 * of that remainder, and `offcut` is what is left after it (0 when the remainder is no
 * wider than a kerf — the saw turns that sliver to dust). So on every board
 *   used + offcut = stock length,  used = trim + pieces + the kerfs actually cut.
 * Four 24" pieces do not fit a 96" board with a 1/8" kerf: three kerfs need 3/8" more.
 */
export type CutListInput = {
  pieces: CutPiece[];
  stock: StockLength[];
  kerf: Fraction;
  /** Allowance cut off each board's factory end first; default 0. */
  trim?: Fraction;
  /** Only for the numbers inside warning messages; the engine itself works in inches. */
  unit?: Unit;
  denominator?: number;
};

export type BoardCut = { label: string; length: Length; /** From the board's left end, after the trim. */ start: Length };

export type BoardPlan = {
  stockIndex: number;
  stockLength: Length;
  /** In order along the board. */
  cuts: BoardCut[];
  /** Pieces + kerfs + trim; used + offcut = stockLength. */
  used: Length;
  /** What is left, past the last cut, to keep. */
  offcut: Length;
  price?: number;
};

export type StockToBuy = { stockIndex: number; stockLength: Length; count: number; /** Price of one board. */ price?: number };

export type CutListResult = {
  boards: BoardPlan[];
  boardCount: number;
  /** What to buy, by stock length, in the order the stock was given. */
  byStock: StockToBuy[];
  /** When every board bought has a price. */
  totalCost?: number;
  /** No plan can use fewer boards than this (Martello–Toth L2 bound on the longest stock). */
  lowerBound: number;
  /**
   * Proven best: fewest boards, then least cost (when every stock length has a price), then
   * least waste. True when the exact search finished, or when the plan meets a lower bound
   * on all three (`lowerBound` boards, and no `lowerBound` boards could cost less or be
   * shorter). A plan with `boardCount === lowerBound` has the fewest boards even when this
   * is false: then only the mix of stock lengths is unproven.
   */
  optimal: boolean;
  method: "exact" | "heuristic";
  totalPieceLength: Length;
  totalStockLength: Length;
  /** (stock bought − pieces) as a percentage of stock bought: kerfs, trim and offcuts. */
  wastePercent: number;
  /** Pieces longer than every stock length after the trim; they are not in `boards`. */
  unplaced: CutPiece[];
  warnings: Warning[];
};

/** Up to this many pieces (total quantity), the plan comes from the exact search. */
export const EXACT_PIECE_LIMIT = 30;
/** Placements the exact search may try before it settles for the best plan found. */
export const EXACT_NODE_BUDGET = 500_000;

type Item = { row: number; size: number };

function checkInput(input: CutListInput) {
  const negative = (f: Fraction) => f.s < 0n && f.n !== 0n;
  const positive = (f: Fraction) => f.s > 0n && f.n !== 0n;
  if (input.stock.length === 0) throw new RangeError("at least one stock length is needed");
  if (negative(input.kerf)) throw new RangeError(`kerf must be zero or more, got ${input.kerf.toString()}`);
  if (input.trim && negative(input.trim)) throw new RangeError(`trim must be zero or more, got ${input.trim.toString()}`);
  input.stock.forEach((stock, i) => {
    if (!positive(stock.length)) throw new RangeError(`stock ${i + 1} length must be more than zero`);
    if (stock.price !== undefined && !(Number.isFinite(stock.price) && stock.price >= 0)) throw new RangeError(`stock ${i + 1} price must be zero or more`);
  });
  input.pieces.forEach((piece, i) => {
    if (!positive(piece.length)) throw new RangeError(`piece ${i + 1} length must be more than zero`);
    if (!Number.isInteger(piece.quantity) || piece.quantity < 0) throw new RangeError(`piece ${i + 1} quantity must be a whole number`);
  });
}

const gcd = (a: bigint, b: bigint): bigint => (b === 0n ? a : gcd(b, a % b));
const lcmOf = (values: Fraction[]) => values.reduce((l, f) => (l / gcd(l, f.d)) * f.d, 1n);

// Lengths finer than this are planned on it (a millionth of an inch, far below any tape's reading).
const FINE_GRID = 1n << 20n;
const floorDiv = (n: bigint, d: bigint) => (n >= 0n ? n / d : -((-n + d - 1n) / d));

/**
 * Whole numbers for the packers: every length times the least common denominator, which plans
 * exactly. When that would not fit in a double (lengths typed or computed to absurdly fine
 * fractions), it plans on a 1/1,048,576 grid instead, rounding each piece up and each board's room
 * down, so whatever fits on the grid fits the real lengths too; `exact` says which it was.
 */
function scaler(values: Fraction[]) {
  const lcm = lcmOf(values);
  const largest = values.reduce((most, f) => (f.abs().compare(most) > 0 ? f.abs() : most), ZERO);
  // Room for sums of many lengths as well as each one.
  const exact = largest.mul(new Fraction(lcm)).compare(Number.MAX_SAFE_INTEGER / 1024) <= 0;
  const scale = exact ? lcm : FINE_GRID;
  return {
    exact,
    toInt(f: Fraction, round: "up" | "down" = "down"): number {
      const signed = f.s < 0n ? -f.n : f.n;
      const product = signed * scale;
      const whole = round === "up" ? -floorDiv(-product, f.d) : floorDiv(product, f.d);
      if (whole > BigInt(Number.MAX_SAFE_INTEGER) || whole < -BigInt(Number.MAX_SAFE_INTEGER)) throw new RangeError("the lengths are too long to plan");
      return Number(whole);
    },
  };
}

export function cutList(input: CutListInput): CutListResult {
  checkInput(input);
  const kerf = input.kerf;
  const trim = input.trim ?? ZERO;
  const say = (value: Length) => formatMeasure(value, { denominator: input.denominator ?? 16, unit: input.unit ?? "in", style: "feet-inches" }).text;
  const warnings: Warning[] = [];

  const usable = input.stock.map((stock) => stock.length.sub(trim));
  const lengths = scaler([kerf, trim, ...input.stock.map((s) => s.length), ...input.pieces.map((p) => p.length)]);
  if (!lengths.exact) {
    warnings.push({ code: "planned-on-a-grid", message: "Some lengths are divided finer than a millionth of an inch, so boards were planned with each piece rounded up to that: the plan fits, but it may not be the fewest boards." });
  }
  const priced = input.stock.filter((stock) => stock.price !== undefined).length;
  const useCost = priced === input.stock.length;
  if (priced > 0 && !useCost) {
    warnings.push({ code: "price-missing", message: "Some stock lengths have no price, so the plan does not compare cost: it uses the fewest boards, then the shortest." });
  }
  const prices = input.stock.map((stock) => (stock.price === undefined ? ZERO : exactFromNumber(stock.price)));
  const money = scaler(prices);

  const options: StockOption[] = [];
  input.stock.forEach((stock, index) => {
    if (!gt(usable[index], ZERO)) {
      warnings.push({ code: "stock-shorter-than-trim", message: `The ${say(stock.length)} stock is no longer than the ${say(trim)} trim, so it is never used.` });
      return;
    }
    options.push({ capacity: lengths.toInt(usable[index].add(kerf), "down"), cost: useCost ? money.toInt(prices[index], "up") : 0, length: lengths.toInt(stock.length), index });
  });
  const longestUsable = options.length > 0 ? usable[options.reduce((a, b) => (b.capacity > a.capacity ? b : a)).index] : ZERO;

  const unplaced: CutPiece[] = [];
  const items: Item[] = [];
  input.pieces.forEach((piece, row) => {
    if (piece.quantity === 0) return;
    if (lte(piece.length, longestUsable)) {
      const size = lengths.toInt(piece.length.add(kerf), "up");
      for (let k = 0; k < piece.quantity; k++) items.push({ row, size });
      return;
    }
    unplaced.push({ ...piece });
    warnings.push({ code: "piece-longer-than-stock", message: tooLongMessage(piece, input, longestUsable, say) });
  });
  items.sort((a, b) => b.size - a.size || a.row - b.row);
  const sizes = items.map((item) => item.size);
  const mostCost = Math.max(0, ...options.map((option) => option.cost));
  if (sizes.reduce((a, b) => a + b, 0) > Number.MAX_SAFE_INTEGER || mostCost * items.length > Number.MAX_SAFE_INTEGER) {
    throw new RangeError("the pieces are too many to plan exactly");
  }

  const method = items.length <= EXACT_PIECE_LIMIT ? "exact" : "heuristic";
  if (items.length === 0) return assemble(input, [], items, null, { lowerBound: 0, optimal: true, method, unplaced, warnings });

  const chooser = new StockChooser(options);
  const lowerBound = lowerBoundL2(sizes, chooser.capacity);
  const bound = bestPossible(chooser, lowerBound, sizes.reduce((a, b) => a + b, 0));
  let packing: Packing = heuristicPacking(sizes, chooser);
  let complete = false;
  if (method === "exact") {
    const exact = exactPacking(sizes, chooser, packing, bound, EXACT_NODE_BUDGET);
    packing = exact.packing;
    complete = exact.complete;
  }
  const optimal = lengths.exact && (complete || compareScores(scorePacking(packing, sizes, chooser), bound) <= 0);
  if (!optimal && lengths.exact) warnings.push(notProvenMessage(packing.filter((board) => board.length > 0).length, lowerBound));
  return assemble(input, packing, items, chooser, { lowerBound, optimal, method, unplaced, warnings });
}

type Verdict = Pick<CutListResult, "lowerBound" | "optimal" | "method" | "unplaced" | "warnings">;

function assemble(input: CutListInput, packing: Packing, items: Item[], chooser: StockChooser | null, verdict: Verdict): CutListResult {
  const kerf = input.kerf;
  const trim = input.trim ?? ZERO;
  const boards: BoardPlan[] = [];
  for (const board of packing) {
    if (board.length === 0 || !chooser) continue;
    const load = board.reduce((total, item) => total + items[item].size, 0);
    const stockIndex = chooser.best(load).index;
    const stock = input.stock[stockIndex];
    const pieces = board.map((item) => input.pieces[items[item].row]).sort((a, b) => b.length.compare(a.length));
    const cuts: BoardCut[] = [];
    let position = ZERO;
    for (const piece of pieces) {
      cuts.push({ label: piece.label, length: piece.length, start: position });
      position = position.add(piece.length).add(kerf);
    }
    // `position` now sits one kerf past the last piece: the remainder's parting cut.
    const remainder = stock.length.sub(trim).sub(position);
    const offcut = gt(remainder, ZERO) ? remainder : ZERO;
    boards.push({ stockIndex, stockLength: stock.length, cuts, used: stock.length.sub(offcut), offcut, ...(stock.price !== undefined && { price: stock.price }) });
  }
  boards.sort((a, b) => a.stockIndex - b.stockIndex || a.offcut.compare(b.offcut));

  const byStock: StockToBuy[] = [];
  for (const board of boards) {
    const last = byStock[byStock.length - 1];
    if (last && last.stockIndex === board.stockIndex) last.count += 1;
    else byStock.push({ stockIndex: board.stockIndex, stockLength: board.stockLength, count: 1, ...(board.price !== undefined && { price: board.price }) });
  }
  const everyPriced = boards.every((board) => board.price !== undefined);
  const totalCost = everyPriced ? sum(boards.map((board) => exactFromNumber(board.price!))).valueOf() : undefined;
  const totalPieceLength = sum(boards.flatMap((board) => board.cuts.map((cut) => cut.length)));
  const totalStockLength = sum(boards.map((board) => board.stockLength));
  const wastePercent = totalStockLength.n === 0n ? 0 : toNumber(totalStockLength.sub(totalPieceLength).div(totalStockLength).mul(100));
  return {
    boards,
    boardCount: boards.length,
    byStock,
    ...(totalCost !== undefined && { totalCost }),
    lowerBound: verdict.lowerBound,
    optimal: verdict.optimal,
    method: verdict.method,
    totalPieceLength,
    totalStockLength,
    wastePercent,
    unplaced: verdict.unplaced,
    warnings: verdict.warnings,
  };
}

function tooLongMessage(piece: CutPiece, input: CutListInput, longestUsable: Length, say: (value: Length) => string): string {
  const trim = input.trim ?? ZERO;
  const longestStock = input.stock.reduce((a, b) => (gt(b.length, a) ? b.length : a), ZERO);
  const name = piece.label.trim() || "piece";
  const afterTrim = trim.n === 0n ? "" : ` once the ${say(trim)} trim is cut off`;
  const longest = trim.n === 0n || longestUsable.n === 0n ? `${say(longestStock)} is the longest` : `the longest leaves ${say(longestUsable)}`;
  const needed = piece.length.add(trim);
  // Lumber is sold in 2-foot steps (common practice); in millimetres just say how long.
  const suggestion = (input.unit ?? "in") === "mm" ? `a board at least ${say(fromMillimetres(toMillimetres(needed).ceil()))} long would do` : `a ${needed.div(24).ceil().mul(2).toString()}' board would do`;
  const left = piece.quantity > 1 ? `All ${piece.quantity} are left off the plan.` : "It is left off the plan.";
  return `The ${say(piece.length)} ${name} is longer than every stock length${afterTrim} (${longest}); ${suggestion}. ${left}`;
}

function notProvenMessage(boards: number, lowerBound: number): Warning {
  const message =
    boards > lowerBound
      ? `This plan uses ${boards} boards. No plan can use fewer than ${lowerBound}, and none with ${lowerBound} was found: this one is good, but not proven the fewest.`
      : `This plan uses the fewest boards possible (${boards}), but a cheaper or less wasteful mix of stock lengths may exist.`;
  return { code: "not-proven-optimal", message };
}
