import { describe, expect, it } from "vitest";
import { all, create } from "mathjs";
import { Fraction } from "@/lib/layout/core";
import { DRY_WIDTH } from "@/lib/layout/lumber";
import { evenSpacing } from "@/lib/layout/spacing";
import { wallGrid, type WallGridInput } from "@/lib/layout/wall-grid";
import { wallGridSchema } from "@/lib/layout/wall-grid-schema";

const f = (value: number | string) => new Fraction(value);
const codes = (warnings: { code: string }[]) => warnings.map((w) => w.code);
const math = create(all, { number: "BigNumber", precision: 60 });
/** The nearest sixteenth of a value worked in mathjs BigNumbers (decimal.js), as a Fraction. */
const sixteenth = (value: { times(n: number): { round(): { toNumber(): number } } }) => new Fraction(value.times(16).round().toNumber(), 16);
const stock = [{ length: f(96) }, { length: f(120) }, { length: f(144) }];

// common practice, no source: the accent wall every check below is built on.
const base: WallGridInput = {
  wallWidth: f("128.75"),
  wallHeight: f(96),
  topRailWidth: f("5.5"),
  bottomRailWidth: f("2.5"),
  baseTrimHeight: f(4),
  verticalWidth: f("2.5"),
  verticalCount: 6,
  rows: 0,
  stock,
  kerf: new Fraction(1, 8),
  denominator: 16,
};

describe("wallGrid cuts and marks", () => {
  it("gives five bays of 22 3/4 and marks the second vertical 25 1/4 from the wall", () => {
    // common practice, no source: 128 3/4" wide, six 2 1/2" verticals flush at each end.
    const grid = wallGrid(base);
    expect(grid.verticals).toHaveLength(6);
    expect(grid.bays).toHaveLength(5);
    expect(grid.bay.exact.equals("22.75")).toBe(true);
    expect(grid.verticals[1].startMark.rounded.equals("25.25")).toBe(true);
    expect(grid.verticals[5].end.equals("128.75")).toBe(true);
  });

  it("cuts the verticals to the height less the top board, the bottom rail and the base trim", () => {
    // common practice, no source: 96 − 5 1/2 − 2 1/2 − 4 = 84".
    const grid = wallGrid(base);
    expect(grid.verticalLength.exact.equals(84)).toBe(true);
    expect(grid.rails.bottom.bottom.equals(4)).toBe(true);
    expect(grid.rails.top.bottom.equals("90.5")).toBe(true);
    expect(grid.pieces.find((p) => p.kind === "vertical")).toMatchObject({ quantity: 6 });
    expect(grid.pieces.find((p) => p.kind === "vertical")!.length.equals(84)).toBe(true);
  });

  it("uses the same marks as even spacing rather than working them out again", () => {
    const grid = wallGrid(base);
    const spacing = evenSpacing({ span: base.wallWidth, memberWidth: base.verticalWidth, count: 6, endCondition: "members", denominator: 16 });
    expect(grid.verticals.map((v) => v.startMark.rounded.toFraction())).toEqual(spacing.members.map((m) => m.startMark.rounded.toFraction()));
  });

  it("splits the height between the rails into equal panels and cuts row rails to the bay", () => {
    // common practice, no source: the row rails between those verticals are 22 3/4".
    // Two 2 1/2" rows in 84": panels of (84 − 5) / 3 = 26 1/3, checked in mathjs BigNumbers.
    const grid = wallGrid({ ...base, rows: 2 });
    const panel = math.bignumber(84).minus(5).div(3);
    expect(grid.panelHeight.exact.equals(new Fraction(79, 3))).toBe(true);
    const firstBottom = math.bignumber("6.5").plus(panel);
    const secondBottom = firstBottom.plus("2.5").plus(panel);
    expect(grid.rows[0].bottomMark.rounded.equals(sixteenth(firstBottom))).toBe(true);
    expect(grid.rows[1].bottomMark.rounded.equals(sixteenth(secondBottom))).toBe(true);
    expect(grid.rows[1].bottomMark.rounded.equals(new Fraction(987, 16))).toBe(true);
    expect(grid.rows[1].top.add(grid.panelHeight.exact).equals("90.5")).toBe(true);
    const rowRails = grid.pieces.find((p) => p.kind === "row-rail")!;
    expect(rowRails.quantity).toBe(10);
    expect(rowRails.length.equals("22.75")).toBe(true);
  });

  it("chooses the fewest verticals for a maximum bay", () => {
    const grid = wallGrid({ ...base, verticalCount: undefined, maxBay: f(24) });
    expect(grid.verticals).toHaveLength(6);
    expect(grid.bays.every((bay) => bay.end.sub(bay.start).compare(24) <= 0)).toBe(true);
  });
});

describe("wallGrid studs", () => {
  const studs = { firstStudCenter: f(0) };

  it("says which verticals land on a stud and which miss every stud", () => {
    // Studs 16" o.c. from the left end (IRC Table R602.3(5) spacing) plus an end stud at the
    // right wall. Verticals at 0, 25 1/4, 50 1/2, 75 3/4, 101, 126 1/4 (computed): only the
    // two at the wall ends lie 1/2" or more over a stud's 1 1/2" face.
    const grid = wallGrid({ ...base, studs });
    expect(grid.verticals.map((v) => v.landsOnStud)).toEqual([true, false, false, false, false, true]);
    const warning = grid.warnings.find((w) => w.code === "misses-studs")!;
    expect(warning.message).toMatch(/^Verticals 2, 3, 4, 5 miss every stud/);
    expect(warning.message).toMatch(/nail at an angle into the plate, or glue and pin/);
  });

  it("counts exactly 1/2 of overlap as landing, and 7/16 as missing", () => {
    // Vertical 2 covers 25 1/4 to 27 3/4. A stud centred at 25 covers 24 1/4 to 25 3/4: 1/2 over.
    const only = (center: Fraction) => ({ firstStudCenter: center, studSpacing: f(1000), endStuds: false });
    expect(wallGrid({ ...base, studs: only(f(25)) }).verticals[1].landsOnStud).toBe(true);
    expect(wallGrid({ ...base, studs: only(f(25).sub(new Fraction(1, 16))) }).verticals[1].landsOnStud).toBe(false);
  });

  it("leaves stud warnings out when no framing is given", () => {
    const grid = wallGrid(base);
    expect(grid.studs).toEqual([]);
    expect(codes(grid.warnings)).not.toContain("misses-studs");
  });

  it("warns when a bay's row rails cross no stud", () => {
    // Twelve verticals leave bays of 98 3/4 / 11 = 8 43/44 (computed); studs 24" o.c. from 12
    // (12, 36, 60, 84, 108) fall inside bays 6, 8 and 10 only. The stud at 12 lies under
    // vertical 2 (11 21/44 to 13 43/44), not in a bay.
    const grid = wallGrid({ ...base, rows: 1, verticalCount: 12, studs: { firstStudCenter: f(12), studSpacing: f(24), endStuds: false } });
    expect(grid.bays.filter((bay) => bay.studs.length > 0).map((bay) => bay.index)).toEqual([6, 8, 10]);
    expect(grid.verticals[1].studs).toEqual([1]);
    expect(grid.warnings.find((w) => w.code === "row-misses-studs")!.message).toMatch(/^The row rails in bays 1, 2, 3, 4, 5, 7, 9, 11 cross no stud/);
    expect(codes(wallGrid({ ...base, verticalCount: 12, studs: { firstStudCenter: f(12), studSpacing: f(24) } }).warnings)).not.toContain("row-misses-studs");
  });
});

describe("wallGrid rails and the cut list", () => {
  // Invented demo: a 141 1/2" hallway wall, 1x4 battens (3 1/2" actual, PS 20 Table 3), a
  // 1x6 top rail (5 1/2") and a 1x4 bottom rail, 8' ceiling, no base trim, studs 16" o.c.
  const hallway: WallGridInput = {
    ...base,
    wallWidth: f("141.5"),
    topRailWidth: DRY_WIDTH[6],
    bottomRailWidth: DRY_WIDTH[4],
    baseTrimHeight: f(0),
    verticalWidth: DRY_WIDTH[4],
    verticalCount: 7,
    studs: { firstStudCenter: f(16) },
    stock: [{ length: f(96) }],
  };

  it("lays out the demo hallway wall", () => {
    // (141 1/2 − 7 × 3 1/2) / 6 = 19 1/2" bays; 96 − 5 1/2 − 3 1/2 = 87" verticals (computed).
    const grid = wallGrid(hallway);
    expect(grid.bay.exact.equals("19.5")).toBe(true);
    expect(grid.verticalLength.exact.equals(87)).toBe(true);
    expect(grid.verticals.map((v) => v.startMark.rounded.valueOf())).toEqual([0, 23, 46, 69, 92, 115, 138]);
  });

  it("splits a rail longer than the stock with each joint on a stud centre", () => {
    // 141 1/2 needs two pieces of 8' stock; the stud nearest midway (70 3/4) is at 64.
    const grid = wallGrid(hallway);
    expect(grid.rails.top.pieces.map((p) => p.valueOf())).toEqual([64, 77.5]);
    expect(grid.rails.top.jointsOnStuds).toBe(true);
    expect(grid.rails.top.joints[0].rounded.equals(64)).toBe(true);
    expect(codes(grid.warnings).filter((c) => c === "rail-split")).toHaveLength(2);
  });

  it("splits a rail into equal pieces when there is no framing, and says to join over a stud", () => {
    const grid = wallGrid({ ...hallway, studs: undefined });
    expect(grid.rails.bottom.pieces.map((p) => p.valueOf())).toEqual([70.75, 70.75]);
    expect(grid.warnings.find((w) => w.code === "rail-split")!.message).toMatch(/Join each seam over a stud/);
  });

  it("does not split a rail that one stock length covers", () => {
    const grid = wallGrid({ ...hallway, stock: [{ length: f(96) }, { length: f(144) }] });
    expect(grid.rails.top.pieces).toHaveLength(1);
    expect(codes(grid.warnings)).not.toContain("rail-split");
  });

  it("runs one cut list per face width and places every piece once", () => {
    const grid = wallGrid(hallway);
    expect(grid.cutLists.map((list) => list.memberWidth.valueOf())).toEqual([5.5, 3.5]);
    for (const list of grid.cutLists) {
      const wanted = list.pieces.reduce((n, p) => n + p.quantity, 0);
      const cut = list.result.boards.reduce((n, b) => n + b.cuts.length, 0);
      expect(cut).toBe(wanted);
      expect(list.result.unplaced).toEqual([]);
    }
    // 1x4: two rail pieces (64, 77 1/2) and seven 87" verticals, each needing its own 8' board.
    expect(grid.cutLists[1].result.boardCount).toBe(9);
    expect(grid.boardCount).toBe(grid.cutLists[0].result.boardCount + 9);
  });

  it("rejects rails and base trim that leave no height", () => {
    expect(() => wallGrid({ ...base, baseTrimHeight: f(90) })).toThrow(RangeError);
  });

  it("passes on a no-room warning when the verticals do not fit", () => {
    const grid = wallGrid({ ...base, verticalCount: 60 });
    expect(codes(grid.warnings)).toContain("no-room");
    expect(grid.verticals).toEqual([]);
    expect(grid.pieces.some((p) => p.kind === "vertical")).toBe(false);
  });
});

describe("wallGridSchema", () => {
  const body = { wallWidth: "10' 8 3/4\"", wallHeight: "8'", topRailWidth: "5 1/2", bottomRailWidth: "2 1/2", baseTrimHeight: "4", verticalWidth: "2 1/2", verticalCount: "6" };
  const issues = (input: unknown) => {
    const parsed = wallGridSchema.safeParse(input);
    return parsed.success ? [] : parsed.error.issues.map((issue) => ({ path: issue.path.join("."), message: issue.message }));
  };

  it("reads the form into the engine's input with stock, kerf and rows defaulted", () => {
    const parsed = wallGridSchema.parse(body);
    expect(parsed.wallWidth.equals("128.75")).toBe(true);
    expect(parsed.rows).toBe(0);
    expect(parsed.kerf.equals(new Fraction(1, 8))).toBe(true);
    expect(parsed.stock.map((s) => s.length.valueOf())).toEqual([96, 120, 144]);
    expect(parsed.studs).toBeUndefined();
    const grid = wallGrid(parsed);
    expect(grid.verticalLength.exact.equals(84)).toBe(true);
    expect(grid.bay.exact.equals("22.75")).toBe(true);
  });

  it("turns on the stud check when the first stud is given, and reads stock in the chosen unit", () => {
    const parsed = wallGridSchema.parse({ ...body, unit: "in", firstStudCenter: "0", studSpacing: "24", endStuds: "false", stock: ["8'", { length: 120, price: 9.5 }] });
    expect(parsed.studs?.studSpacing?.equals(24)).toBe(true);
    expect(parsed.studs?.endStuds).toBe(false);
    expect(parsed.stock[1]).toMatchObject({ price: 9.5 });
    expect(parsed.stock[0].length.equals(96)).toBe(true);
    const metric = wallGridSchema.parse({ ...body, unit: "mm", stock: [2400] });
    expect(metric.stock[0].length.equals(new Fraction(2400).div("25.4"))).toBe(true);
  });

  it("names the field of every rejection", () => {
    expect(issues({ ...body, wallHeight: "12" })).toEqual([
      { path: "wallHeight", message: "The top rail, bottom rail and base trim take the whole wall height: nothing is left for the verticals." },
    ]);
    expect(issues({ ...body, maxBay: "24" })).toEqual([{ path: "verticalCount", message: "Give either the number of verticals or the widest bay, not both." }]);
    expect(issues({ ...body, verticalCount: "1" })).toEqual([{ path: "verticalCount", message: "Number of verticals must be at least 2." }]);
    expect(issues({ ...body, rows: "-1" })).toEqual([{ path: "rows", message: "Rows must be at least 0." }]);
    expect(issues({ ...body, stock: ["8'", "ten"] })[0]).toMatchObject({ path: "stock.1", message: expect.stringMatching(/^Stock length 2: could not read "ten"/) });
    expect(issues({ ...body, stock: [{ length: "8'", price: -1 }] })[0].path).toBe("stock.0.price");
    expect(issues({ ...body, trim: "12'" })).toEqual([{ path: "trim", message: expect.stringMatching(/^End trim must be at most/) }]);
    expect(issues({ ...body, stock: ["6"], trim: "6" })).toEqual([{ path: "trim", message: "The end trim is as long as the longest stock: no board would be left to cut." }]);
    expect(issues({ ...body, studSpacing: "16" })).toEqual([{ path: "firstStudCenter", message: "Give the first stud's centre too, measured from the left end of the wall." }]);
    expect(issues({ ...body, verticalCount: "", maxBay: "1/64", verticalWidth: "1/64" })).toEqual([{ path: "maxBay", message: "That widest bay needs more than 200 verticals; make it larger." }]);
  });
});
