import { describe, expect, it } from "vitest";
import { Fraction, sum } from "@/lib/layout/core";
import { fewestBalusters, guardSpacing } from "@/lib/layout/guards";
import { guardSpacingSchema } from "@/lib/layout/guards-schema";

const f = (value: number | string) => new Fraction(value);
const codes = (warnings: { code: string }[]) => warnings.map((w) => w.code);

describe("guardSpacing", () => {
  it("puts 13 balusters in a 72 span, 14 openings of 3 3/4", () => {
    // A general how-to page (medium confidence): 72" between posts, 1 1/2" balusters,
    // openings under 4" → 13 balusters, 14 spaces, 52 1/2 / 14 = 3 3/4".
    const guard = guardSpacing({ span: f(72), balusterWidth: f("1.5"), denominator: 16 });
    expect(guard.count).toBe(13);
    expect(guard.spaces).toBe(14);
    expect(guard.freeSpace.equals("52.5")).toBe(true);
    expect(guard.gap.equals("3.75")).toBe(true);
    expect(guard.roundedGap.rounded.equals("3.75")).toBe(true);
    expect(guard.warnings).toEqual([]);
  });

  it("needs 9 balusters in a 52 span, openings of 3.85", () => {
    // Same page's rule, computed: 52", 1 1/2" balusters → 9, gap (52 − 13 1/2) / 10 = 3.85".
    const guard = guardSpacing({ span: f(52), balusterWidth: f("1.5"), denominator: 16 });
    expect(guard.count).toBe(9);
    expect(guard.gap.equals("3.85")).toBe(true);
    // 3.85 × 16 = 61.6 → 62/16 = 3 7/8 on the tape.
    expect(guard.roundedGap.rounded.equals("3.875")).toBe(true);
    expect(guard.oneFewer).not.toBeNull();
    expect(guard.oneFewer!.opening.compare(4)).toBeGreaterThanOrEqual(0);
  });

  it("adds a baluster when the openings would be exactly 4", () => {
    // IRC 2018 R312.1.3: a 4" sphere must not pass, so 4" exactly fails. 48 = 8 × 1 1/2 + 9 × 4
    // (computed): eight balusters leave openings of exactly 4, so nine are needed.
    const guard = guardSpacing({ span: f(48), balusterWidth: f("1.5"), denominator: 16 });
    expect(guard.count).toBe(9);
    expect(guard.oneFewer).toEqual({ count: 8, opening: f(4) });
    expect(guard.gap.equals("3.45")).toBe(true);
    expect(guard.openings.every((opening) => opening.width.compare(4) < 0)).toBe(true);
  });

  it("lists every opening post to post, and openings plus balusters fill the span", () => {
    const guard = guardSpacing({ span: f(52), balusterWidth: f("1.5"), denominator: 16 });
    expect(guard.openings).toHaveLength(10);
    expect(guard.openings[0].start.equals(0)).toBe(true);
    expect(guard.openings[9].end.equals(52)).toBe(true);
    expect(guard.openings.every((opening) => opening.width.equals(guard.gap))).toBe(true);
    expect(sum(guard.openings.map((o) => o.width)).add(guard.totalMemberWidth).equals(52)).toBe(true);
    expect(guard.members[1].startMark.rounded.equals(f("3.85").mul(2).add("1.5").mul(16).round().div(16))).toBe(true);
  });

  it("honours a different limit, such as the open side of a stair", () => {
    // IRC 2018 R312.1.3 exception: 4 3/8" on the open sides of a stair. (72 − 4 3/8) / 5 7/8
    // = 11.51 → 12 balusters, 13 openings of (72 − 18) / 13 = 4 2/13 (computed).
    const guard = guardSpacing({ span: f(72), balusterWidth: f("1.5"), maxOpening: f("4.375"), denominator: 16 });
    expect(guard.count).toBe(12);
    expect(guard.gap.equals(new Fraction(54, 13))).toBe(true);
    expect(guard.limitNote).toMatch(/4 3\/8"/);
  });

  it("warns when an opening under the limit reads 4 on the tape", () => {
    // Eight balusters and nine openings of 3 63/64 make 47 55/64; at sixteenths 3 63/64 reads 4.
    const span = f("1.5").mul(8).add(new Fraction(255, 64).mul(9));
    const guard = guardSpacing({ span, balusterWidth: f("1.5"), denominator: 16 });
    expect(guard.count).toBe(8);
    expect(codes(guard.warnings)).toEqual(["rounded-opening-at-limit"]);
    const finer = guardSpacing({ span, balusterWidth: f("1.5"), denominator: 64 });
    expect(codes(finer.warnings)).toEqual([]);
  });

  it("needs no baluster in a span already under the limit", () => {
    const guard = guardSpacing({ span: f("3.5"), balusterWidth: f("1.5"), denominator: 16 });
    expect(guard.count).toBe(0);
    expect(guard.openings).toHaveLength(1);
    expect(guard.openings[0].width.equals("3.5")).toBe(true);
    expect(guard.oneFewer).toBeNull();
    expect(codes(guard.warnings)).toEqual(["no-baluster-needed"]);
    expect(fewestBalusters(f(4), f("1.5"), f(4))).toBe(1);
  });

  it("says when balusters this wide cannot leave openings under the limit", () => {
    const guard = guardSpacing({ span: f(10), balusterWidth: f(20), denominator: 16 });
    expect(codes(guard.warnings)).toContain("no-room");
    expect(guard.openings).toEqual([]);
  });

  it("lays out the demo porch guard", () => {
    // Invented demo: a 9' 2" porch guard with 1 1/2" balusters. (110 − 4) / 5 1/2 = 19.27
    // → 20 balusters, 21 openings of 80/21 = 3 17/21" → 3 13/16" on the tape (computed).
    const guard = guardSpacing({ span: f(110), balusterWidth: f("1.5"), denominator: 16 });
    expect(guard.count).toBe(20);
    expect(guard.gap.equals(new Fraction(80, 21))).toBe(true);
    expect(guard.roundedGap.rounded.equals(new Fraction(61, 16))).toBe(true);
  });
});

describe("guardSpacingSchema", () => {
  const issues = (body: unknown) => {
    const parsed = guardSpacingSchema.safeParse(body);
    return parsed.success ? [] : parsed.error.issues.map((issue) => ({ path: issue.path.join("."), message: issue.message }));
  };

  it("reads the demo porch guard in feet and inches and fills in the 4 limit", () => {
    const parsed = guardSpacingSchema.parse({ span: "9' 2\"", balusterWidth: "1 1/2", maxOpening: "" });
    expect(parsed.span.equals(110)).toBe(true);
    expect(parsed.maxOpening.equals(4)).toBe(true);
    expect(guardSpacing(parsed).count).toBe(20);
  });

  it("names the field of every rejection", () => {
    expect(issues({ span: "0", balusterWidth: "1 1/2" })).toEqual([{ path: "span", message: "Span between posts must be more than 0." }]);
    expect(issues({ span: "72", balusterWidth: "" })).toEqual([{ path: "balusterWidth", message: "Baluster width: enter a length." }]);
    expect(issues({ span: "72", balusterWidth: "1 1/2", maxOpening: "4 3/" })[0].path).toBe("maxOpening");
    expect(issues({ span: "72 ft", balusterWidth: "1/64", maxOpening: "1/64" })).toEqual([{ path: "span", message: expect.stringMatching(/more than 10,000 balusters/) }]);
  });
});
