import { createHmac } from "node:crypto";
import { describe, expect, it } from "vitest";
import { partCountOf, variantSeed } from "@/lib/assignments/variants";
import { findKind, PROBLEM_KINDS } from "@/lib/problems";
import { MAX_SEED } from "@/lib/problems/random";

const SECRET = "a-test-secret-of-at-least-thirty-two-characters";

describe("variant seeds", () => {
  it("are the same for the same item, student and variant, every time", () => {
    expect(variantSeed(SECRET, 7, 42, 0)).toBe(variantSeed(SECRET, 7, 42, 0));
    expect(variantSeed(SECRET, 7, 42, 3)).toBe(variantSeed(SECRET, 7, 42, 3));
  });

  it("follow the HMAC of item:student:variant, reduced into 1…MAX_SEED", () => {
    const digest = createHmac("sha256", SECRET).update("7:42:1").digest();
    expect(variantSeed(SECRET, 7, 42, 1)).toBe((digest.readUInt32BE(0) % MAX_SEED) + 1);
  });

  it("differ between students, variants, items and secrets", () => {
    const seeds = new Set<number>();
    for (let student = 1; student <= 40; student++) for (let variant = 0; variant < 5; variant++) seeds.add(variantSeed(SECRET, 3, student, variant));
    // 200 draws from two billion: a repeat would mean the inputs are not all reaching the hash.
    expect(seeds.size).toBe(200);
    expect(variantSeed(SECRET, 3, 1, 0)).not.toBe(variantSeed(SECRET, 4, 1, 0));
    expect(variantSeed(SECRET, 3, 1, 0)).not.toBe(variantSeed(`${SECRET}x`, 3, 1, 0));
    // "1:23:4" and "12:3:4" must not collide: the separators keep the fields apart.
    expect(variantSeed(SECRET, 1, 23, 4)).not.toBe(variantSeed(SECRET, 12, 3, 4));
  });

  it("always land in the generators' seed range and give different problems to neighbours", () => {
    for (let i = 0; i < 2000; i++) {
      const seed = variantSeed(SECRET, i % 13, i, i % 10);
      expect(Number.isInteger(seed)).toBe(true);
      expect(seed).toBeGreaterThanOrEqual(1);
      expect(seed).toBeLessThanOrEqual(MAX_SEED);
    }
    const kind = findKind("even-gap")!;
    const prompts = new Set([1, 2, 3, 4, 5, 6].map((student) => kind.render(kind.generate(variantSeed(SECRET, 9, student, 0), 1)).text));
    expect(prompts.size).toBeGreaterThan(1);
  });

  it("store the number of answer boxes the rebuilt problem has", () => {
    for (const kind of PROBLEM_KINDS) {
      const seed = variantSeed(SECRET, 1, 1, 0);
      expect(partCountOf(kind.key, 2, seed)).toBe(kind.parts(kind.generate(seed, 2)).length);
    }
  });
});
