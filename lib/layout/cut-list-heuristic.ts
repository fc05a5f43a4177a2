// The packing core of the cut list, shared by the heuristic and the exact search.
// Everything here is an integer: the caller scales every length by a common denominator
// (so the arithmetic is exact) and adds one kerf to each piece and to each board's usable
// length, so "these pieces fit on this board" is simply "their sizes sum to no more than
// the board's capacity".

/** One stock length the plan may buy, in scaled integers. `cost` is 0 when cost is not compared. */
export type StockOption = { capacity: number; cost: number; length: number; index: number };

/** Boards, each a list of indices into the (descending) `sizes`. */
export type Packing = number[][];

/** The objective, compared in this order: fewest boards, then least cost, then least stock length. */
export type Score = { count: number; cost: number; length: number };

export function compareScores(a: Score, b: Score): number {
  return a.count - b.count || a.cost - b.cost || a.length - b.length;
}

/**
 * For a board load, the stock to cut it from: the cheapest board that holds it, and among
 * equally cheap ones the shortest (least waste). Any plan can cut each board from this
 * stock without getting worse, so the searches only choose which pieces share a board.
 */
export class StockChooser {
  readonly capacity: number;
  readonly cheapest: StockOption;
  readonly byCapacity: readonly StockOption[];
  private readonly bestFrom: StockOption[];

  constructor(options: readonly StockOption[]) {
    if (options.length === 0) throw new RangeError("at least one usable stock length is needed");
    const byCapacity = [...options].sort((a, b) => a.capacity - b.capacity || a.index - b.index);
    this.byCapacity = byCapacity;
    this.bestFrom = new Array(byCapacity.length);
    let best = byCapacity[byCapacity.length - 1];
    for (let i = byCapacity.length - 1; i >= 0; i--) {
      const option = byCapacity[i];
      if (option.cost < best.cost || (option.cost === best.cost && option.length <= best.length)) best = option;
      this.bestFrom[i] = best;
    }
    this.capacity = byCapacity[byCapacity.length - 1].capacity;
    this.cheapest = this.bestFrom[0];
  }

  /** The stock any plan would ever cut from (the rest is never the best choice), cheapest first. */
  get choices(): StockOption[] {
    return [...new Set(this.bestFrom)].sort((a, b) => a.cost - b.cost || a.length - b.length);
  }

  /** Whether the board choice can vary at all; with one real choice only the count matters. */
  get hasChoice(): boolean {
    return this.bestFrom.some((option) => option !== this.cheapest);
  }

  best(load: number): StockOption {
    let lo = 0;
    let hi = this.byCapacity.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (this.byCapacity[mid].capacity >= load) hi = mid;
      else lo = mid + 1;
    }
    return this.bestFrom[lo];
  }
}

export function scorePacking(packing: Packing, sizes: readonly number[], chooser: StockChooser): Score {
  const score: Score = { count: 0, cost: 0, length: 0 };
  for (const board of packing) {
    if (board.length === 0) continue;
    const option = chooser.best(board.reduce((load, item) => load + sizes[item], 0));
    score.count += 1;
    score.cost += option.cost;
    score.length += option.length;
  }
  return score;
}

function firstFitDecreasing(sizes: readonly number[], capacity: number): Packing {
  // A max tree over the room left in each board finds the first board that fits in log time,
  // so a very long list stays fast. Unopened boards have full room, so they come last.
  let width = 1;
  while (width < sizes.length) width *= 2;
  const room = new Float64Array(2 * width).fill(-1);
  for (let i = 0; i < sizes.length; i++) room[width + i] = capacity;
  for (let node = width - 1; node >= 1; node--) room[node] = Math.max(room[2 * node], room[2 * node + 1]);
  const packing: Packing = [];
  sizes.forEach((size, item) => {
    let node = 1;
    while (node < width) node = room[2 * node] >= size ? 2 * node : 2 * node + 1;
    const board = node - width;
    (packing[board] ??= []).push(item);
    room[node] -= size;
    for (node >>= 1; node >= 1; node >>= 1) room[node] = Math.max(room[2 * node], room[2 * node + 1]);
  });
  return packing;
}

function bestFitDecreasing(sizes: readonly number[], capacity: number): Packing {
  const packing: Packing = [];
  const loads: number[] = [];
  sizes.forEach((size, item) => {
    let chosen = -1;
    for (let b = 0; b < loads.length; b++) {
      if (loads[b] + size <= capacity && (chosen < 0 || loads[b] > loads[chosen])) chosen = b;
    }
    if (chosen < 0) {
      chosen = loads.length;
      loads.push(0);
      packing.push([]);
    }
    loads[chosen] += size;
    packing[chosen].push(item);
  });
  return packing;
}

/**
 * Minimum bin slack: start each board with the longest piece left, then search the other
 * pieces (grouped by size) for the set that fills the board best. The search per board is
 * capped, so the fill is "as good as found".
 */
function minimumSlack(sizes: readonly number[], capacity: number, nodesPerBoard: number): Packing {
  const distinct: number[] = [];
  const itemsOf: number[][] = [];
  sizes.forEach((size, item) => {
    if (distinct[distinct.length - 1] !== size) {
      distinct.push(size);
      itemsOf.push([]);
    }
    itemsOf[itemsOf.length - 1].push(item);
  });
  const left = itemsOf.map((items) => items.length);
  const packing: Packing = [];
  let first = 0;
  const taken = new Array<number>(distinct.length).fill(0);
  let bestTaken = taken.slice();
  for (;;) {
    while (first < distinct.length && left[first] === 0) first++;
    if (first === distinct.length) return packing;
    left[first]--;
    taken.fill(0);
    taken[first] = 1;
    bestTaken = taken.slice();
    let bestLoad = distinct[first];
    let nodes = 0;
    const search = (from: number, load: number): void => {
      if (load > bestLoad) {
        bestLoad = load;
        bestTaken = taken.slice();
      }
      for (let t = from; t < distinct.length && bestLoad < capacity && nodes < nodesPerBoard; t++) {
        if (left[t] === 0 || load + distinct[t] > capacity) continue;
        nodes++;
        left[t]--;
        taken[t]++;
        search(t, load + distinct[t]);
        taken[t]--;
        left[t]++;
      }
    };
    search(first, distinct[first]);
    left[first]++;
    const board: number[] = [];
    bestTaken.forEach((count, t) => {
      for (let k = 0; k < count; k++) board.push(itemsOf[t][itemsOf[t].length - left[t]--]);
    });
    packing.push(board);
  }
}

type Boards = { items: number[][]; loads: number[] };

function toBoards(packing: Packing, sizes: readonly number[]): Boards {
  const items = packing.filter((board) => board.length > 0).map((board) => [...board]);
  return { items, loads: items.map((board) => board.reduce((load, item) => load + sizes[item], 0)) };
}

/**
 * Try to empty one board by moving its pieces into the room left on the others; when a
 * piece fits nowhere, swap it for a shorter piece on another board and carry that one
 * instead. Works on copies and commits only if the board empties.
 */
function tryEmptyBoard(boards: Boards, target: number, sizes: readonly number[], capacity: number): Boards | null {
  const items = boards.items.map((board) => [...board]);
  const loads = [...boards.loads];
  const pending = [...items[target]].sort((a, b) => sizes[b] - sizes[a]);
  let steps = 0;
  const stepLimit = 4 * pending.length * items.length + 16;
  while (pending.length > 0) {
    if (++steps > stepLimit) return null;
    const piece = pending.shift()!;
    const size = sizes[piece];
    let home = -1;
    for (let b = 0; b < items.length; b++) {
      if (b !== target && loads[b] + size <= capacity && (home < 0 || loads[b] > loads[home])) home = b;
    }
    if (home >= 0) {
      items[home].push(piece);
      loads[home] += size;
      continue;
    }
    // Swap for the shortest piece that makes room, leaving the fullest board behind.
    let swapBoard = -1;
    let swapAt = -1;
    for (let b = 0; b < items.length; b++) {
      if (b === target) continue;
      items[b].forEach((other, at) => {
        const shorter = sizes[other];
        if (shorter >= size || loads[b] - shorter + size > capacity) return;
        if (swapBoard < 0 || shorter < sizes[items[swapBoard][swapAt]]) {
          swapBoard = b;
          swapAt = at;
        }
      });
    }
    if (swapBoard < 0) return null;
    const carried = items[swapBoard][swapAt];
    items[swapBoard][swapAt] = piece;
    loads[swapBoard] += size - sizes[carried];
    const at = pending.findIndex((p) => sizes[p] < sizes[carried]);
    pending.splice(at < 0 ? pending.length : at, 0, carried);
  }
  items.splice(target, 1);
  loads.splice(target, 1);
  return { items, loads };
}

function emptyLightBoards(start: Boards, sizes: readonly number[], capacity: number): Boards {
  let boards = start;
  for (let round = 0; round < 64 && boards.items.length > 1; round++) {
    const lightest = boards.loads.map((load, b) => [load, b]).sort((a, b) => a[0] - b[0]).slice(0, 3);
    let emptied: Boards | null = null;
    for (const [, b] of lightest) {
      emptied = tryEmptyBoard(boards, b, sizes, capacity);
      if (emptied) break;
    }
    if (!emptied) break;
    boards = emptied;
  }
  return boards;
}

/**
 * With several stock lengths, move or swap pieces between boards while that makes the plan
 * cheaper (or shorter at the same cost) without adding a board — e.g. draining a board
 * enough that it can come from a shorter, cheaper length.
 */
function rebalanceStock(boards: Boards, sizes: readonly number[], chooser: StockChooser, maxPasses: number): void {
  const { items, loads } = boards;
  const capacity = chooser.capacity;
  // Change in (boards, cost, length) when two boards go from loads (a, b) to (a2, b2).
  const improves = (a: number, b: number, a2: number, b2: number): boolean => {
    let count = 0;
    let cost = 0;
    let length = 0;
    for (const [load, sign] of [[a, -1], [b, -1], [a2, 1], [b2, 1]] as const) {
      if (load === 0) continue;
      const option = chooser.best(load);
      count += sign;
      cost += sign * option.cost;
      length += sign * option.length;
    }
    return count < 0 || (count === 0 && (cost < 0 || (cost === 0 && length < 0)));
  };
  for (let pass = 0; pass < maxPasses; pass++) {
    let improved = false;
    for (let a = 0; a < items.length; a++) {
      for (let b = 0; b < items.length; b++) {
        if (a === b || items[a].length === 0) continue;
        for (let i = 0; i < items[a].length; i++) {
          const x = items[a][i];
          const sx = sizes[x];
          if (loads[b] + sx <= capacity && improves(loads[a], loads[b], loads[a] - sx, loads[b] + sx)) {
            items[a].splice(i, 1);
            items[b].push(x);
            loads[a] -= sx;
            loads[b] += sx;
            improved = true;
            break;
          }
          let swapped = false;
          for (let j = 0; j < items[b].length && !swapped; j++) {
            const shift = sx - sizes[items[b][j]];
            if (shift === 0 || loads[b] + shift > capacity || loads[a] - shift > capacity) continue;
            if (!improves(loads[a], loads[b], loads[a] - shift, loads[b] + shift)) continue;
            items[a][i] = items[b][j];
            items[b][j] = x;
            loads[a] -= shift;
            loads[b] += shift;
            swapped = true;
          }
          if (swapped) {
            improved = true;
            break;
          }
        }
      }
    }
    for (let b = items.length - 1; b >= 0; b--) {
      if (items[b].length === 0) {
        items.splice(b, 1);
        loads.splice(b, 1);
      }
    }
    if (!improved) return;
  }
}

// Above these sizes the quadratic steps are skipped; first fit alone stays n log n.
const QUADRATIC_LIMIT = 3000;
const IMPROVE_LIMIT = 600;

/** The best plan the heuristics find: several constructions, each then improved. */
export function heuristicPacking(sizes: readonly number[], chooser: StockChooser): Packing {
  const capacity = chooser.capacity;
  const candidates: Packing[] = [firstFitDecreasing(sizes, capacity)];
  if (sizes.length <= QUADRATIC_LIMIT) {
    candidates.push(bestFitDecreasing(sizes, capacity), minimumSlack(sizes, capacity, 2000));
  }
  let best: Boards | null = null;
  let bestScore: Score | null = null;
  for (const candidate of candidates) {
    let boards = toBoards(candidate, sizes);
    if (sizes.length <= IMPROVE_LIMIT) boards = emptyLightBoards(boards, sizes, capacity);
    const score = scorePacking(boards.items, sizes, chooser);
    if (!bestScore || compareScores(score, bestScore) < 0) {
      best = boards;
      bestScore = score;
    }
  }
  if (chooser.hasChoice && sizes.length <= IMPROVE_LIMIT) rebalanceStock(best!, sizes, chooser, 6);
  return best!.items;
}
