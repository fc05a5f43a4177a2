// The seeded generator behind every problem: the same (kind, level, seed) always gives the same
// numbers, so a student's variant can be rebuilt from its stored seed on any server.
import { uniformInt } from "pure-rand/distribution/uniformInt";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";

export type Random = {
  /** An integer from min to max, both included. */
  int(min: number, max: number): number;
  pick<T>(items: readonly T[]): T;
  /** True with probability numerator/denominator (integers, so no float decides it). */
  chance(numerator: number, denominator: number): boolean;
  /** `count` distinct items, in random order. */
  sample<T>(items: readonly T[], count: number): T[];
};

export const MAX_SEED = 2 ** 31 - 1;

export function createRandom(seed: number): Random {
  if (!Number.isInteger(seed) || seed < 0 || seed > MAX_SEED) throw new RangeError(`seed must be an integer from 0 to ${MAX_SEED}, got ${seed}`);
  const rng = xoroshiro128plus(seed);
  const int = (min: number, max: number) => {
    if (!Number.isInteger(min) || !Number.isInteger(max) || max < min) throw new RangeError(`bad range ${min}…${max}`);
    return uniformInt(rng, min, max);
  };
  return {
    int,
    pick: (items) => {
      if (items.length === 0) throw new RangeError("cannot pick from an empty list");
      return items[int(0, items.length - 1)];
    },
    chance: (numerator, denominator) => int(1, denominator) <= numerator,
    sample: (items, count) => {
      const pool = [...items];
      const out = [];
      for (let i = 0; i < Math.min(count, pool.length); i++) out.push(...pool.splice(int(0, pool.length - 1), 1));
      return out;
    },
  };
}

/** A fresh seed for a new problem; the grader stores it, the client never sees it. */
export function newSeed(): number {
  const buf = new Uint32Array(1);
  globalThis.crypto.getRandomValues(buf);
  return buf[0] & MAX_SEED;
}
