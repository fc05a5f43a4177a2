import { describe, expect, it } from "vitest";
import { all, create, type BigNumber } from "mathjs";
import { Fraction, fromMillimetres, toMillimetres } from "@/lib/layout/core";
import { evenSpacing, fewestMembersForMaxGap } from "@/lib/layout/spacing";
import { evenSpacingSchema } from "@/lib/layout/spacing-schema";

const f = (value: number | string) => new Fraction(value);
const codes = (warnings: { code: string }[]) => warnings.map((w) => w.code);
// mathjs's BigNumber (decimal.js, 60 digits) is arithmetic independent of fraction.js.
const math = create(all, { number: "BigNumber", precision: 60 });
const big = (value: number | string) => math.bignumber(value);
const asBig = (value: Fraction) => math.bignumber((value.s * value.n).toString()).div(math.bignumber(value.d.toString()));
const agrees = (value: Fraction, expected: BigNumber) => asBig(value).minus(expected).abs().lt(big("1e-40"));

describe("evenSpacing with members flush at both ends", () => {
  // common practice, no source: a 128 3/4" wall, six 2 1/2" battens, one flush at each end.
  const wall = evenSpacing({ span: f("128.75"), memberWidth: f("2.5"), count: 6, endCondition: "members", denominator: 16 });

  it("divides the free space by the spaces, not the members", () => {
    expect(wall.spaces).toBe(5);
    expect(wall.totalMemberWidth.equals(15)).toBe(true);
    expect(wall.freeSpace.equals("113.75")).toBe(true);
    expect(wall.gap.equals("22.75")).toBe(true);
    expect(wall.onCenter.equals("25.25")).toBe(true);
  });

  it("marks the second batten's left edge 25 1/4 from the wall and the last one flush", () => {
    expect(wall.members[1].startMark.rounded.equals("25.25")).toBe(true);
    expect(wall.members[0].start.equals(0)).toBe(true);
    expect(wall.members[5].end.equals("128.75")).toBe(true);
    expect(wall.members[5].center.equals(wall.members[5].start.add("1.25"))).toBe(true);
    expect(wall.warnings).toEqual([]);
  });

  it("agrees with mathjs's decimal arithmetic on a gap that is not a whole sixteenth", () => {
    // Independent computation in mathjs BigNumbers: (span − n·w) / (n − 1), then 3 on-centres.
    const result = evenSpacing({ span: f("100"), memberWidth: f("1.5"), count: 7, endCondition: "members", denominator: 16 });
    const gap = big(100).minus(big("1.5").times(7)).div(6);
    expect(agrees(result.gap, gap)).toBe(true);
    expect(agrees(result.members[3].start, gap.plus(big("1.5")).times(3))).toBe(true);
  });

  it("rounds every mark once from the exact position, and reports the drift of adding rounded gaps", () => {
    // 89 1/2 / 6 = 14 11/12; to sixteenths 14 15/16, 1/48 long; six spaces × 1/48 = 1/8 (computed).
    const result = evenSpacing({ span: f("100"), memberWidth: f("1.5"), count: 7, endCondition: "members", denominator: 16 });
    expect(result.roundedGap.rounded.equals("14.9375")).toBe(true);
    expect(result.driftIfGapsAdded.equals(new Fraction(1, 8))).toBe(true);
    expect(codes(result.warnings)).toContain("rounding-drift");
    for (const member of result.members) {
      expect(member.startMark.exact.equals(member.start)).toBe(true);
      expect(member.startMark.error.abs().compare(new Fraction(1, 32))).toBeLessThanOrEqual(0);
    }
    // The last start is 6 × 16 5/12 = 98 1/2 exactly; six added rounded on-centres would say 98 5/8.
    expect(result.members[6].startMark.rounded.equals("98.5")).toBe(true);
  });
});

describe("evenSpacing with a gap at each end", () => {
  it("lays 13 balusters between posts 72 apart with 3 3/4 gaps", () => {
    // A general how-to page (medium confidence): 72", 1 1/2" balusters → 14 spaces of 3 3/4".
    const result = evenSpacing({ span: f(72), memberWidth: f("1.5"), count: 13, endCondition: "gaps", denominator: 16 });
    expect(result.spaces).toBe(14);
    expect(result.gap.equals("3.75")).toBe(true);
    expect(result.members[0].start.equals("3.75")).toBe(true);
    expect(result.members[12].end.add(result.gap).equals(72)).toBe(true);
  });

  it("finds the fewest members for a maximum gap, and a gap exactly at the maximum is allowed", () => {
    // (72 − 4) / 5 1/2 = 12.36 → 13 members (computed from the rule).
    expect(fewestMembersForMaxGap(f(72), f("1.5"), f(4), "gaps")).toBe(13);
    // 8 × 1 1/2 + 9 × 4 = 48: eight members leave gaps of exactly 4, which "at most 4" accepts.
    const result = evenSpacing({ span: f(48), memberWidth: f("1.5"), maxGap: f(4), endCondition: "gaps", denominator: 16 });
    expect(result.count).toBe(8);
    expect(result.gap.equals(4)).toBe(true);
  });

  it("chooses the fewest flush members for a maximum bay", () => {
    // (128 3/4 + 24) / (2 1/2 + 24) = 5.76 → 6 battens, bays 22 3/4 (computed).
    const result = evenSpacing({ span: f("128.75"), memberWidth: f("2.5"), maxGap: f(24), endCondition: "members", denominator: 16 });
    expect(result.count).toBe(6);
    expect(result.gap.equals("22.75")).toBe(true);
    const fewer = evenSpacing({ span: f("128.75"), memberWidth: f("2.5"), count: 5, endCondition: "members", denominator: 16 });
    expect(fewer.gap.compare(24)).toBeGreaterThan(0);
  });
});

describe("evenSpacing warnings", () => {
  it("says when the members do not fit and draws nothing", () => {
    const result = evenSpacing({ span: f(12), memberWidth: f(5), count: 3, endCondition: "members", denominator: 16 });
    expect(codes(result.warnings)).toEqual(["no-room"]);
    expect(result.members).toEqual([]);
    expect(result.freeSpace.equals(-3)).toBe(true);
    expect(result.warnings[0].message).toMatch(/15".*12"/);
  });

  it("says when the members fill the span or leave a gap under 1/4", () => {
    const full = evenSpacing({ span: f(12), memberWidth: f(3), count: 4, endCondition: "members", denominator: 16 });
    expect(codes(full.warnings)).toEqual(["no-gap"]);
    const tight = evenSpacing({ span: f("10.5"), memberWidth: f(1), count: 10, endCondition: "members", denominator: 16 });
    expect(codes(tight.warnings)).toContain("tiny-gap");
  });

  it("warns when the exact gap is under the maximum but the rounded one reads over it", () => {
    // 47 55/64 between posts: eight 1 1/2 members leave nine gaps of exactly the 3 63/64
    // maximum, and to sixteenths that gap reads 4, over the maximum (computed).
    const gap = new Fraction(255, 64);
    const span = f("1.5").mul(8).add(gap.mul(9));
    const result = evenSpacing({ span, memberWidth: f("1.5"), maxGap: gap, endCondition: "gaps", denominator: 16 });
    expect(result.count).toBe(8);
    expect(result.gap.equals(gap)).toBe(true);
    expect(codes(result.warnings)).toContain("rounded-gap-over-max");
  });

  it("rejects engine input the schema would have refused", () => {
    expect(() => evenSpacing({ span: f(12), memberWidth: f(1), count: 2, maxGap: f(3), endCondition: "members", denominator: 16 })).toThrow(RangeError);
    expect(() => evenSpacing({ span: f(12), memberWidth: f(1), endCondition: "members", denominator: 16 })).toThrow(RangeError);
    expect(() => evenSpacing({ span: f(12), memberWidth: f(1), count: 1, endCondition: "members", denominator: 16 })).toThrow(/at least 2/);
    expect(() => evenSpacing({ span: f(12), memberWidth: f(1), count: 0, endCondition: "gaps", denominator: 16 })).toThrow(/at least 1/);
    expect(() => evenSpacing({ span: f(0), memberWidth: f(1), count: 2, endCondition: "members", denominator: 16 })).toThrow(/span/);
  });
});

describe("evenSpacing in millimetres", () => {
  it("keeps a metric layout exact through the 25.4 conversion", () => {
    // 2400 mm, five 60 mm members flush: (2400 − 300) / 4 = 525 mm (computed).
    const result = evenSpacing({
      span: fromMillimetres(2400),
      memberWidth: fromMillimetres(60),
      count: 5,
      endCondition: "members",
      denominator: 16,
      unit: "mm",
    });
    expect(toMillimetres(result.gap).equals(525)).toBe(true);
    expect(toMillimetres(result.members[2].start).equals(1170)).toBe(true);
    const cramped = evenSpacing({ span: fromMillimetres(100), memberWidth: fromMillimetres(60), count: 2, endCondition: "members", denominator: 16, unit: "mm" });
    expect(cramped.warnings[0].message).toMatch(/120 mm.*100 mm/);
  });
});

describe("evenSpacingSchema", () => {
  const issues = (body: unknown) => {
    const parsed = evenSpacingSchema.safeParse(body);
    return parsed.success ? [] : parsed.error.issues.map((issue) => ({ path: issue.path.join("."), message: issue.message }));
  };

  it("reads tape notation into the engine's exact input, with the defaults", () => {
    const parsed = evenSpacingSchema.parse({ span: "10' 8 3/4\"", memberWidth: "2-1/2", count: "6" });
    expect(parsed.span.equals("128.75")).toBe(true);
    expect(parsed.memberWidth.equals("2.5")).toBe(true);
    expect(parsed).toMatchObject({ count: 6, endCondition: "members", unit: "in", denominator: 16 });
    expect(evenSpacing(parsed).gap.equals("22.75")).toBe(true);
  });

  it("reads numbers in the chosen unit and a maximum gap in place of a count", () => {
    const parsed = evenSpacingSchema.parse({ unit: "mm", denominator: "32", span: 2400, memberWidth: "60", maxGap: 600, count: "" });
    expect(toMillimetres(parsed.span).equals(2400)).toBe(true);
    expect(parsed.maxGap && toMillimetres(parsed.maxGap).equals(600)).toBe(true);
    expect(parsed.count).toBeUndefined();
    expect(parsed.denominator).toBe(32);
  });

  it("names the field of every rejection in a plain sentence", () => {
    expect(issues({ span: "ten feet", memberWidth: "1 1/2", count: 3 })).toEqual([{ path: "span", message: expect.stringMatching(/^Span: could not read "ten"/) }]);
    expect(issues({ span: "96", memberWidth: "-1", count: 3 })).toEqual([{ path: "memberWidth", message: "Member width must be at least 0\"." }]);
    expect(issues({ span: "96", memberWidth: "1", count: 1 })).toEqual([{ path: "count", message: "Member count must be at least 2." }]);
    expect(issues({ span: "96", memberWidth: "1", count: 1, endCondition: "gaps" })).toEqual([]);
    expect(issues({ span: "96", memberWidth: "1", count: "2.5" })).toEqual([{ path: "count", message: "Member count must be a whole number, like 2." }]);
    expect(issues({ span: "96", memberWidth: "1", count: 4, maxGap: "3" })).toEqual([{ path: "count", message: "Give either a member count or a maximum gap, not both." }]);
    expect(issues({ span: "96", memberWidth: "1" })).toEqual([{ path: "count", message: "Give a member count or a maximum gap." }]);
    expect(issues({ span: "96", memberWidth: "1", count: 3, endCondition: "ends" })[0].path).toBe("endCondition");
    expect(issues({ span: "96", memberWidth: "1", count: 3, denominator: 10 })[0]).toMatchObject({ path: "denominator", message: expect.stringMatching(/2, 4, 8, 16, 32 or 64/) });
    expect(issues({ span: "9600", memberWidth: "0", maxGap: "1/64" })).toEqual([{ path: "maxGap", message: expect.stringMatching(/more than 10,000 members/) }]);
  });
});
