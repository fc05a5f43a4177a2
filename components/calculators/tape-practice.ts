// Targets for the tape-reading practice. The target comes from a seed kept in the address,
// so a shared link (or a reload) asks for the same length; there is no server and nothing is
// graded, so a small hash-and-shift generator is enough here.

/** The longest reading the drawn tape goes to, in inches (a 25' tape). */
export const TAPE_MAX_INCHES = 300;
/** How many inches of tape are drawn at once. */
export const TAPE_WINDOW_INCHES = 3;

export type PractiseTarget = {
  /** The length to find, in steps of 1/precision. */
  steps: number;
  /** The first inch drawn while looking for it, so the target is on the tape in view. */
  windowStart: number;
};

// FNV-1a: the same text always gives the same 32-bit start, whatever the browser.
function hash(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}

// mulberry32: a tiny, well-spread generator over 32-bit state.
function generator(seed: number): () => number {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const pick = (next: () => number, from: number, to: number) => from + Math.floor(next() * (to - from + 1));

/**
 * A length between 1" and 96" (a sheet's length) that is never a whole inch, so there is
 * always a fraction to read, and where the drawn tape starts while it is found.
 */
export function practiseTarget(seed: string, precision: number): PractiseTarget {
  const next = generator(hash(`${seed}/${precision}`));
  const whole = pick(next, 1, 95);
  const part = pick(next, 1, precision - 1);
  const windowStart = Math.max(0, whole - pick(next, 0, TAPE_WINDOW_INCHES - 1));
  return { steps: whole * precision + part, windowStart };
}

/** A fresh seed for the "give me a length" button: short, so the address stays readable. */
export function newPractiseSeed(): string {
  const bytes = new Uint32Array(1);
  crypto.getRandomValues(bytes);
  return bytes[0].toString(36);
}

/** The first inch to draw so that `steps` stays in view, moving the tape as little as possible. */
export function followWindow(windowStart: number, steps: number, precision: number): number {
  const lastStart = TAPE_MAX_INCHES - TAPE_WINDOW_INCHES;
  let start = windowStart;
  if (steps < start * precision) start = Math.floor(steps / precision);
  else if (steps > (start + TAPE_WINDOW_INCHES) * precision) start = Math.ceil(steps / precision) - TAPE_WINDOW_INCHES;
  return Math.min(lastStart, Math.max(0, start));
}
