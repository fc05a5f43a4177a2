// The exact search for short cut lists. Sizes are the scaled integers of
// cut-list-heuristic.ts (piece + one kerf; capacity = usable length + one kerf), sorted
// longest first.
import { compareScores, scorePacking, type Packing, type Score, type StockChooser, type StockOption } from "./cut-list-heuristic";

/**
 * Martello and Toth's L2 bound on the number of boards of one capacity: pieces over half a
 * board each need their own board, and the small pieces must overflow the room those boards
 * leave. Any mix of stock lengths needs at least as many boards as the longest stock alone.
 * `sizes` must be sorted descending and none may exceed `capacity`.
 */
export function lowerBoundL2(sizes: readonly number[], capacity: number): number {
  const n = sizes.length;
  if (n === 0) return 0;
  const ascending = [...sizes].reverse();
  const prefix = [0];
  for (const size of ascending) prefix.push(prefix[prefix.length - 1] + size);
  // First index whose size exceeds `value` (sizes are integers).
  const countAtMost = (value: number) => {
    let lo = 0;
    let hi = n;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (ascending[mid] <= value) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
  const half = Math.floor(capacity / 2);
  const overHalf = countAtMost(half);
  let bound = Math.ceil(prefix[n] / capacity);
  const thresholds = new Set<number>([0]);
  for (let i = 0; i < overHalf; i++) thresholds.add(ascending[i]);
  for (const alpha of thresholds) {
    const big = countAtMost(capacity - alpha); // sizes above capacity − α start here
    const small = countAtMost(alpha - 1); // sizes of at least α start here
    const mediumCount = big - overHalf;
    const roomInMedium = mediumCount * capacity - (prefix[big] - prefix[overHalf]);
    const smallSum = prefix[overHalf] - prefix[small];
    const overflow = Math.max(0, Math.ceil((smallSum - roomInMedium) / capacity));
    bound = Math.max(bound, n - big + mediumCount + overflow);
  }
  return bound;
}

/**
 * The best score any plan could have, so a plan that reaches it is proven best:
 * - boards: the L2 bound `boardsAtLeast`;
 * - cost: each board at least the cheapest stock, and the whole plan at least the lowest
 *   cost per unit of capacity times all the pieces;
 * - length: each board at least the shortest stock, and the boards' capacities must hold
 *   all the pieces (stock length − capacity is the same trim − kerf for every stock).
 */
export function bestPossible(chooser: StockChooser, boardsAtLeast: number, totalSize: number): Score {
  const options = chooser.byCapacity;
  const count = boardsAtLeast;
  // In bigint: cost × total size can pass 2^53.
  const costFloor = options.reduce((floor, option) => {
    const least = (BigInt(option.cost) * BigInt(totalSize) + BigInt(option.capacity) - 1n) / BigInt(option.capacity);
    return Math.min(floor, Number(least));
  }, Infinity);
  const shortest = options.reduce((a, b) => (b.length < a.length ? b : a));
  const over = options[0].length - options[0].capacity;
  const sameOver = options.every((option) => option.length - option.capacity === over);
  const holdsAll = sameOver ? Math.max(count * shortest.capacity, totalSize) + count * over : 0;
  return { count, cost: Math.max(count * chooser.cheapest.cost, costFloor), length: Math.max(count * shortest.length, holdsAll) };
}

export type ExactResult = { packing: Packing; score: Score; complete: boolean };

type Budget = { nodes: number };

/**
 * Whether the pieces can be cut from exactly these boards (`capacities`; a board may stay
 * unused), and how. Bin completion: take the longest piece left and choose, together,
 * the board it goes on and everything else that board gets, then go on with the rest.
 * - Only full boards are tried — a board no piece left would still fit on. (If a piece
 *   that fits were cut from another board instead, moving it here breaks nothing.)
 * - Waste budget: the room the boards have beyond the pieces' total is all the slack there
 *   is; a board filled with more slack than is left cannot lead to a plan.
 * - Boards of one capacity are interchangeable, and a state (pieces left, boards left)
 *   that failed once fails again, so it is remembered.
 * Returns null when the pieces do not fit or the budget ran out (`budget.nodes` < 0 then).
 */
function place(sizes: readonly number[], capacities: readonly number[], budget: Budget): Packing | null {
  const values: number[] = [];
  const itemsOf: number[][] = [];
  sizes.forEach((size, item) => {
    if (values[values.length - 1] !== size) {
      values.push(size);
      itemsOf.push([]);
    }
    itemsOf[itemsOf.length - 1].push(item);
  });
  const left = itemsOf.map((items) => items.length);
  const boardSizes = [...new Set(capacities)].sort((a, b) => b - a);
  const boardsLeft = boardSizes.map((capacity) => capacities.filter((c) => c === capacity).length);
  const slack = capacities.reduce((a, b) => a + b, 0) - sizes.reduce((a, b) => a + b, 0);
  // A state is the count left of each size and of each board, written as one mixed-radix
  // number (exact while the radixes multiply to under 2^53, else a string).
  const radixes = [...itemsOf.map((items) => items.length + 1), ...boardsLeft.map((count) => count + 1)];
  const places: number[] = [];
  let span = 1;
  for (const radix of radixes) {
    places.push(span);
    span *= radix;
  }
  const exactKeys = span <= Number.MAX_SAFE_INTEGER;
  let state = 0;
  left.forEach((count, t) => (state += count * places[t]));
  boardsLeft.forEach((count, j) => (state += count * places[values.length + j]));
  const failed = new Set<number | string>();
  const filled: number[][] = []; // per board used: how many of each size
  const fill = new Array<number>(values.length).fill(0);

  const solve = (slackLeft: number): boolean => {
    const first = left.findIndex((count) => count > 0);
    if (first < 0) return true;
    const key = exactKeys ? state : `${left.join(",")}|${boardsLeft.join(",")}`;
    if (failed.has(key)) return false;
    const longest = values[first];
    for (let j = 0; j < boardSizes.length; j++) {
      const capacity = boardSizes[j];
      if (boardsLeft[j] === 0 || capacity < longest) continue;
      for (const option of fullBoards(capacity, first, slackLeft)) {
        if (--budget.nodes < 0) return false;
        option.forEach((count, t) => (left[t] -= count));
        boardsLeft[j] -= 1;
        const change = option.reduce((total, count, t) => total + count * places[t], 0) + places[values.length + j];
        state -= change;
        filled.push(option);
        const load = option.reduce((total, count, t) => total + count * values[t], 0);
        if (solve(slackLeft - (capacity - load))) return true;
        filled.pop();
        state += change;
        boardsLeft[j] += 1;
        option.forEach((count, t) => (left[t] += count));
        if (budget.nodes < 0) return false;
      }
    }
    failed.add(key);
    return false;
  };

  // Every full board of this capacity holding one piece of size `first`, least slack first.
  const fullBoards = (capacity: number, first: number, slackLeft: number): number[][] => {
    const found: { counts: number[]; slack: number }[] = [];
    const available = [...left];
    available[first] -= 1;
    const reach = new Array<number>(values.length + 1).fill(0);
    for (let t = values.length - 1; t >= 0; t--) reach[t] = reach[t + 1] + available[t] * values[t];
    fill.fill(0);
    fill[first] = 1;
    const need = capacity - slackLeft; // the least load that keeps within the slack
    const walk = (t: number, load: number) => {
      if (--budget.nodes < 0 || load + reach[t] < need) return;
      if (t === values.length) {
        const room = capacity - load;
        const fitsMore = available.some((count, u) => count > fill[u] - (u === first ? 1 : 0) && values[u] <= room);
        if (!fitsMore) found.push({ counts: [...fill], slack: room });
        return;
      }
      const most = Math.min(available[t], Math.floor((capacity - load) / values[t]));
      const base = fill[t];
      for (let k = most; k >= 0; k--) {
        fill[t] = base + k;
        walk(t + 1, load + k * values[t]);
      }
      fill[t] = base;
    };
    walk(first, values[first]);
    return found.sort((a, b) => a.slack - b.slack).map((option) => option.counts);
  };

  if (!solve(slack)) return null;
  const next = itemsOf.map(() => 0);
  return filled.map((counts) => counts.flatMap((count, t) => itemsOf[t].slice(next[t], (next[t] += count))));
}

/**
 * Every mix of `count` boards (how many of each stock) that could beat `best` and holds the
 * total size, cheapest first; null if there are more than `limit` of them.
 */
function stockMixes(types: readonly StockOption[], count: number, totalSize: number, best: Score, limit: number): StockOption[][] | null {
  const cheapest = types[0];
  const largest = Math.max(...types.map((t) => t.capacity));
  const mixes: { boards: StockOption[]; score: Score }[] = [];
  const chosen: StockOption[] = [];
  let overflow = false;
  const walk = (t: number, left: number, cost: number, length: number, capacity: number) => {
    if (overflow) return;
    const floor: Score = { count, cost: cost + left * cheapest.cost, length: length + left * cheapest.length };
    if (compareScores(floor, best) >= 0 || capacity + left * largest < totalSize) return;
    if (left === 0) {
      if (mixes.length >= limit) overflow = true;
      else mixes.push({ boards: [...chosen], score: { count, cost, length } });
      return;
    }
    if (t === types.length) return;
    const type = types[t];
    for (let k = left; k >= 0; k--) {
      for (let i = 0; i < k; i++) chosen.push(type);
      walk(t + 1, left - k, cost + k * type.cost, length + k * type.length, capacity + k * type.capacity);
      chosen.length -= k;
    }
  };
  walk(0, count, 0, 0, 0);
  if (overflow) return null;
  return mixes.sort((a, b) => compareScores(a.score, b.score)).map((mix) => mix.boards);
}

const MIX_LIMIT = 5000;

/**
 * The best plan: first the fewest boards (a search on the longest stock alone, where every
 * dominance rule holds), then — when there is a real choice of stock — the cheapest (then
 * shortest) mix of that many boards that the pieces can be placed on, trying mixes in
 * order so the first that works is the best. `complete` says the whole search finished
 * within `nodeBudget` placements, in which case the plan is optimal. `incumbent` is the
 * heuristic's plan, kept when nothing beats it.
 */
export function exactPacking(sizes: readonly number[], chooser: StockChooser, incumbent: Packing, root: Score, nodeBudget: number): ExactResult {
  let packing = incumbent;
  let score = scorePacking(incumbent, sizes, chooser);
  if (sizes.length === 0 || compareScores(score, root) <= 0) return { packing, score, complete: true };
  const budget: Budget = { nodes: nodeBudget };

  // Fewest boards: try one fewer than the best plan until that fails.
  let fewest = score.count;
  while (fewest > root.count) {
    const fewer = place(sizes, new Array<number>(fewest - 1).fill(chooser.capacity), budget);
    if (!fewer) break;
    fewest = fewer.length;
    packing = fewer;
    score = scorePacking(fewer, sizes, chooser);
  }
  if (budget.nodes < 0) return { packing, score, complete: false };
  if (!chooser.hasChoice || compareScores(score, root) <= 0) return { packing, score, complete: true };

  const totalSize = sizes.reduce((a, b) => a + b, 0);
  const mixes = stockMixes(chooser.choices, fewest, totalSize, score, MIX_LIMIT);
  if (!mixes) return { packing, score, complete: false };
  for (const mix of mixes) {
    const capacities = mix.map((option) => option.capacity).sort((a, b) => b - a);
    const found = place(sizes, capacities, budget);
    if (budget.nodes < 0) return { packing, score, complete: false };
    if (found) {
      // A board may come out on cheaper stock than its mix allotted; that only helps.
      const foundScore = scorePacking(found, sizes, chooser);
      if (compareScores(foundScore, score) < 0) return { packing: found, score: foundScore, complete: true };
    }
  }
  return { packing, score, complete: true };
}

