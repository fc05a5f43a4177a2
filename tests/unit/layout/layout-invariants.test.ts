// Properties every layout must keep for any valid input: the members and gaps fill the span
// exactly, marks increase, each rounded mark is within half a graduation of its exact
// position, guard openings stay under the limit with the fewest balusters, stairs use the
// fewest risers under the limit, and the wall grid's cut list places every piece once.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { DENOMINATORS, Fraction, sum, type Rounded } from "@/lib/layout/core";
import { guardSpacing } from "@/lib/layout/guards";
import { evenSpacing, type EvenSpacingResult } from "@/lib/layout/spacing";
import { stairLayout } from "@/lib/layout/stairs";
import { wallGrid } from "@/lib/layout/wall-grid";

// Denominators a tape gives, plus 5 and 127 because millimetres arrive as n × 5/127 inches.
const lengthDenominators = [1, 2, 4, 8, 16, 32, 64, 5, 127] as const;
const length = (min: number, max: number) =>
  fc
    .tuple(fc.integer({ min: min * 64, max: max * 64 }), fc.constantFrom(...lengthDenominators))
    .map(([n, d]) => new Fraction(n, 64).mul(d).round().div(d))
    .filter((value) => value.compare(min) >= 0 && value.compare(max) <= 0);
const denominator = fc.constantFrom(...DENOMINATORS);
const codes = (warnings: { code: string }[]) => warnings.map((w) => w.code);

function withinHalfUnit(mark: Rounded, d: number): boolean {
  return mark.error.abs().compare(new Fraction(1, 2 * d)) <= 0 && mark.rounded.mul(d).d === 1n && mark.rounded.sub(mark.exact).equals(mark.error);
}

/** The checks every spaced layout shares; `offset` is 0 unless the layout sits on something. */
function expectSoundLayout(result: EvenSpacingResult, d: number) {
  const { members, gap, span } = result;
  expect(result.totalMemberWidth.add(gap.mul(result.spaces)).equals(span)).toBe(true);
  const endGaps = result.endCondition === "gaps" ? gap.mul(2) : new Fraction(0);
  const between = members.slice(1).map((member, i) => member.start.sub(members[i].end));
  expect(sum(members.map((m) => m.end.sub(m.start))).add(sum(between)).add(endGaps).equals(span)).toBe(true);
  expect(between.every((g) => g.equals(gap))).toBe(true);
  for (let i = 0; i < members.length; i++) {
    const member = members[i];
    for (const mark of [member.startMark, member.centerMark, member.endMark]) expect(withinHalfUnit(mark, d)).toBe(true);
    expect(member.startMark.exact.equals(member.start)).toBe(true);
    if (i > 0) {
      expect(member.start.compare(members[i - 1].start)).toBeGreaterThan(0);
      expect(member.startMark.rounded.compare(members[i - 1].startMark.rounded)).toBeGreaterThanOrEqual(0);
      if (result.onCenter.compare(new Fraction(1, d)) >= 0) {
        expect(member.startMark.rounded.compare(members[i - 1].startMark.rounded)).toBeGreaterThan(0);
      }
    }
  }
}

describe("evenSpacing invariants", () => {
  it("fills the span exactly with rising marks, each within half a graduation", () => {
    fc.assert(
      fc.property(
        length(1, 600),
        length(0, 12),
        fc.integer({ min: 2, max: 120 }),
        fc.constantFrom("members" as const, "gaps" as const),
        denominator,
        (span, memberWidth, count, endCondition, d) => {
          fc.pre(memberWidth.mul(count).compare(span) <= 0);
          expectSoundLayout(evenSpacing({ span, memberWidth, count, endCondition, denominator: d }), d);
        },
      ),
      { numRuns: 300 },
    );
  });

  it("with a maximum gap, uses the fewest members whose gaps are within it", () => {
    fc.assert(
      fc.property(length(1, 600), length(0, 12), length(1, 48), fc.constantFrom("members" as const, "gaps" as const), denominator, (span, memberWidth, maxGap, endCondition, d) => {
        const result = evenSpacing({ span, memberWidth, maxGap, endCondition, denominator: d });
        fc.pre(result.members.length > 0);
        expectSoundLayout(result, d);
        expect(result.gap.compare(maxGap)).toBeLessThanOrEqual(0);
        const least = endCondition === "members" ? 2 : 1;
        if (result.count > least) {
          const fewer = evenSpacing({ span, memberWidth, count: result.count - 1, endCondition, denominator: d });
          expect(fewer.gap.compare(maxGap)).toBeGreaterThan(0);
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe("guardSpacing invariants", () => {
  it("keeps every opening under the limit with the fewest balusters", () => {
    fc.assert(
      fc.property(length(1, 240), length(new Fraction(1, 2).valueOf(), 6), length(2, 6), denominator, (span, balusterWidth, maxOpening, d) => {
        const guard = guardSpacing({ span, balusterWidth, maxOpening, denominator: d });
        fc.pre(guard.warnings.every((w) => w.code !== "no-room"));
        expect(guard.openings).toHaveLength(guard.count + 1);
        expect(guard.openings.every((opening) => opening.width.compare(maxOpening) < 0)).toBe(true);
        expect(sum(guard.openings.map((o) => o.width)).add(guard.totalMemberWidth).equals(span)).toBe(true);
        if (guard.count > 0) {
          expectSoundLayout(guard, d);
          // One baluster fewer, worked from scratch: (span − (n − 1)·w) / n.
          const opening = span.sub(balusterWidth.mul(guard.count - 1)).div(guard.count);
          expect(opening.compare(maxOpening)).toBeGreaterThanOrEqual(0);
          expect(guard.oneFewer!.opening.equals(opening)).toBe(true);
        }
      }),
      { numRuns: 400 },
    );
  });
});

describe("stairLayout invariants", () => {
  it("uses the fewest risers under the maximum and marks them from the floor", () => {
    fc.assert(
      fc.property(length(1, 200), length(4, 9), denominator, (totalRise, maxRiser, d) => {
        const stair = stairLayout({ totalRise, maxRiser, denominator: d });
        expect(stair.riserHeight.exact.compare(maxRiser)).toBeLessThanOrEqual(0);
        expect(stair.riserHeight.exact.mul(stair.riserCount).equals(totalRise)).toBe(true);
        if (stair.riserCount > 1) expect(totalRise.div(stair.riserCount - 1).compare(maxRiser)).toBeGreaterThan(0);
        expect(stair.treadCount).toBe(stair.riserCount - 1);
        expect(stair.steps.every((step) => withinHalfUnit(step.height, d) && withinHalfUnit(step.run, d))).toBe(true);
        expect(stair.steps.at(-1)!.height.exact.equals(totalRise)).toBe(true);
        // Each riser cut between marks rounded once differs from the next by under 2/d.
        expect(stair.riserVariation.compare(new Fraction(2, d))).toBeLessThan(0);
      }),
      { numRuns: 400 },
    );
  });
});

describe("wallGrid invariants", () => {
  it("keeps the verticals, rows and rails exact and cuts every piece from stock once", () => {
    fc.assert(
      fc.property(
        fc.record({
          wallWidth: length(24, 240),
          wallHeight: length(36, 120),
          topRailWidth: length(0, 8),
          bottomRailWidth: length(0, 6),
          baseTrimHeight: length(0, 6),
          verticalWidth: length(1, 6),
          verticalCount: fc.integer({ min: 2, max: 12 }),
          rows: fc.integer({ min: 0, max: 3 }),
          firstStudCenter: length(0, 24),
          kerf: fc.constantFrom(new Fraction(0), new Fraction(1, 8), new Fraction(3, 32)),
        }),
        denominator,
        (input, d) => {
          const grid = wallGrid({
            ...input,
            studs: { firstStudCenter: input.firstStudCenter },
            stock: [{ length: new Fraction(96) }, { length: new Fraction(144) }],
            denominator: d,
          });
          fc.pre(grid.verticals.length > 0 && grid.rows.length === input.rows);
          expectSoundLayout(grid.verticalLayout, d);
          const height = grid.verticalLength.exact.add(input.topRailWidth).add(input.bottomRailWidth).add(input.baseTrimHeight);
          expect(height.equals(input.wallHeight)).toBe(true);
          const panels = grid.panelHeight.exact.mul(input.rows + 1).add(grid.rows.length > 0 ? grid.rows[0].top.sub(grid.rows[0].bottom).mul(input.rows) : 0);
          expect(panels.equals(grid.verticalLength.exact)).toBe(true);
          for (let i = 1; i < grid.rows.length; i++) expect(grid.rows[i].bottom.compare(grid.rows[i - 1].top)).toBeGreaterThan(0);
          expect(grid.rows.every((row) => withinHalfUnit(row.bottomMark, d) && withinHalfUnit(row.topMark, d))).toBe(true);
          for (const rail of [grid.rails.top, grid.rails.bottom]) expect(sum(rail.pieces).equals(input.wallWidth)).toBe(true);
          for (const list of grid.cutLists) {
            const wanted = list.pieces.reduce((n, p) => n + p.quantity, 0);
            // A piece longer than every stock length (a very wide bay) is reported, not cut.
            const unplaced = list.result.unplaced.reduce((n, p) => n + p.quantity, 0);
            expect(list.result.boards.reduce((n, b) => n + b.cuts.length, 0) + unplaced).toBe(wanted);
            if (unplaced > 0) expect(codes(list.result.warnings)).toContain("piece-longer-than-stock");
            for (const board of list.result.boards) {
              const filled = sum(board.cuts.map((c) => c.length)).add(input.kerf.mul(board.cuts.length - 1));
              expect(filled.compare(board.stockLength)).toBeLessThanOrEqual(0);
            }
          }
        },
      ),
      { numRuns: 60 },
    );
  });
});
