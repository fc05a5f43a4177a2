// Wall grid: a board-and-batten or grid wall. A top rail and a bottom rail run the full
// width (the bottom one sitting on any existing base trim), verticals stand between them
// flush at both wall ends, and optional rows of horizontal rails divide the height between
// the rails into equal panels. The verticals are laid out by evenSpacing, never by a
// second copy of that arithmetic, and every mark is rounded once from its exact position.
import { Fraction, ZERO, gte, lte, roundTo, type Length, type Rounded, type Unit, type Warning } from "./core";
import { cutList, type CutListResult, type CutPiece, type StockLength } from "./cut-list";
import { evenSpacing, lengthText, type EvenSpacingResult, type MemberMarks } from "./spacing";

/** A stud's narrow face, 1 1/2" for 2x framing (PS 20 dry dressed 2x thickness). */
export const STUD_FACE = new Fraction(3, 2);
/**
 * This program's rule, not a code's: a member lands on a stud when at least 1/2" of it lies
 * over the stud's face, so a nail driven in the middle of that overlap has 1/4" of stud wood
 * on each side of it.
 */
export const MIN_STUD_OVERLAP = new Fraction(1, 2);
/** IRC Table R602.3(5): studs 16" on centre is the usual layout. */
export const DEFAULT_STUD_SPACING = new Fraction(16);

export type WallGridInput = {
  wallWidth: Length;
  wallHeight: Length;
  topRailWidth: Length;
  bottomRailWidth: Length;
  /** Height of the existing base trim the bottom rail sits on; 0 when there is none. */
  baseTrimHeight: Length;
  verticalWidth: Length;
  /** Exactly one of `verticalCount` (at least 2: one flush at each end) and `maxBay`. */
  verticalCount?: number;
  maxBay?: Length;
  /** Horizontal rows between the rails; 0 is plain board-and-batten. */
  rows: number;
  /** Face width of the row rails; defaults to the vertical width. */
  rowWidth?: Length;
  /**
   * The framing behind the wall: studs from `firstStudCenter` every `studSpacing` (16") across
   * the whole width, plus, unless `endStuds` is false, the stud that ends the framing at each
   * wall end, flush with it (common practice, no source: a framed wall ends in a stud).
   */
  studs?: { firstStudCenter: Length; studSpacing?: Length; endStuds?: boolean };
  stock: StockLength[];
  kerf: Length;
  trim?: Length;
  denominator: number;
  unit?: Unit;
};

export type Stud = { index: number; center: Length; left: Length; right: Length; centerMark: Rounded };
export type VerticalPlacement = MemberMarks & { studs: number[]; landsOnStud: boolean };
export type Bay = { index: number; start: Length; end: Length; studs: number[] };
export type Row = { index: number; bottom: Length; top: Length; bottomMark: Rounded; topMark: Rounded; centerMark: Rounded };
export type RailPlan = {
  label: "top rail" | "bottom rail";
  width: Length;
  /** Bottom and top edge, measured from the floor. */
  bottom: Length;
  top: Length;
  /** Cut lengths, left to right; more than one when the wall is longer than the stock. */
  pieces: Length[];
  /** Where the pieces meet, from the left wall. */
  joints: Rounded[];
  jointsOnStuds: boolean;
};
export type GridPiece = CutPiece & { memberWidth: Length; kind: "top-rail" | "bottom-rail" | "vertical" | "row-rail" };
export type GridCutList = { memberWidth: Length; pieces: GridPiece[]; result: CutListResult };

export type WallGridResult = {
  denominator: number;
  wallWidth: Length;
  wallHeight: Length;
  /** Height − top rail − bottom rail − base trim. */
  verticalLength: Rounded;
  /** The clear gap between verticals, which is also the cut length of every row rail. */
  bay: Rounded;
  verticalLayout: EvenSpacingResult;
  verticals: VerticalPlacement[];
  bays: Bay[];
  /** Clear height of each panel between rails and rows. */
  panelHeight: Rounded;
  rows: Row[];
  rails: { top: RailPlan; bottom: RailPlan };
  studs: Stud[];
  pieces: GridPiece[];
  /** One cut list per face width: a 1x6 rail is not cut from a 1x3 board. */
  cutLists: GridCutList[];
  boardCount: number;
  warnings: Warning[];
};

function studsAcross(wallWidth: Length, input: WallGridInput["studs"], denominator: number): Stud[] {
  if (!input) return [];
  const spacing = input.studSpacing ?? DEFAULT_STUD_SPACING;
  if (spacing.s < 0n || spacing.n === 0n) throw new RangeError("studSpacing must be more than zero");
  const half = STUD_FACE.div(2);
  const centres: Length[] = [];
  for (let center = input.firstStudCenter; center.sub(half).compare(wallWidth) < 0; center = center.add(spacing)) {
    if (center.add(half).compare(0) > 0) centres.push(center);
  }
  if (input.endStuds ?? true) {
    for (const end of [half, wallWidth.sub(half)]) if (!centres.some((c) => c.equals(end))) centres.push(end);
  }
  centres.sort((a, b) => a.compare(b));
  return centres.map((center, i) => ({ index: i + 1, center, left: center.sub(half), right: center.add(half), centerMark: roundTo(center, denominator) }));
}

function overlap(aStart: Length, aEnd: Length, bStart: Length, bEnd: Length): Length {
  const start = aStart.compare(bStart) > 0 ? aStart : bStart;
  const end = aEnd.compare(bEnd) < 0 ? aEnd : bEnd;
  return end.compare(start) > 0 ? end.sub(start) : ZERO;
}

/** `studs` sorted left to right, so the scan stops at the first stud past the member. */
function studsUnder(start: Length, end: Length, studs: Stud[]): number[] {
  const under: number[] = [];
  for (const stud of studs) {
    if (stud.left.compare(end) >= 0) break;
    if (stud.right.compare(start) > 0 && gte(overlap(start, end, stud.left, stud.right), MIN_STUD_OVERLAP)) under.push(stud.index);
  }
  return under;
}

/**
 * Where to join a rail longer than the stock: at stud centres so both ends get nailed,
 * in as few pieces as the stock allows and as near equal as the studs permit. Without a
 * stud near enough, the rail is cut in equal pieces and the caller says the joints miss.
 */
function railJoints(length: Length, longest: Length, studs: Stud[]): { joints: Length[]; onStuds: boolean } {
  if (lte(length, longest)) return { joints: [], onStuds: true };
  const count = Number(length.div(longest).ceil().valueOf());
  const centres = studs.map((stud) => stud.center).filter((c) => c.compare(0) > 0 && c.compare(length) < 0);
  const fits = (joints: Length[]) =>
    [ZERO, ...joints].every((from, i) => {
      const to = i < joints.length ? joints[i] : length;
      return to.compare(from) > 0 && lte(to.sub(from), longest);
    });

  const nearest = Array.from({ length: count - 1 }, (_, i) => {
    const target = length.mul(i + 1).div(count);
    return centres.reduce<Length | null>((best, c) => (best === null || c.sub(target).abs().compare(best.sub(target).abs()) < 0 ? c : best), null);
  });
  if (nearest.every((c) => c !== null) && fits(nearest as Length[])) return { joints: nearest as Length[], onStuds: true };

  // Greedy: each piece as long as the stock allows, ending on a stud centre.
  const greedy: Length[] = [];
  let from = ZERO;
  while (length.sub(from).compare(longest) > 0) {
    const reach = centres.filter((c) => c.compare(from) > 0 && lte(c.sub(from), longest));
    if (reach.length === 0) break;
    from = reach[reach.length - 1];
    greedy.push(from);
  }
  if (greedy.length > 0 && fits(greedy)) return { joints: greedy, onStuds: true };

  return { joints: Array.from({ length: count - 1 }, (_, i) => length.mul(i + 1).div(count)), onStuds: false };
}

function railPlan(label: RailPlan["label"], width: Length, bottom: Length, wallWidth: Length, longest: Length, studs: Stud[], denominator: number): RailPlan {
  const { joints, onStuds } = railJoints(wallWidth, longest, studs);
  const edges = [ZERO, ...joints, wallWidth];
  const pieces = edges.slice(1).map((edge, i) => edge.sub(edges[i]));
  return {
    label,
    width,
    bottom,
    top: bottom.add(width),
    pieces,
    joints: joints.map((joint) => roundTo(joint, denominator)),
    jointsOnStuds: onStuds,
  };
}

function groupPieces(pieces: GridPiece[]): GridPiece[] {
  const grouped: GridPiece[] = [];
  for (const piece of pieces) {
    const same = grouped.find((p) => p.kind === piece.kind && p.length.equals(piece.length) && p.memberWidth.equals(piece.memberWidth));
    if (same) same.quantity += piece.quantity;
    else grouped.push({ ...piece });
  }
  return grouped;
}

function check(name: string, value: Length, allowZero: boolean) {
  if (value.s < 0n || (!allowZero && value.n === 0n)) throw new RangeError(`${name} must be ${allowZero ? "zero or more" : "more than zero"}`);
}

export function wallGrid(input: WallGridInput): WallGridResult {
  const { wallWidth, wallHeight, topRailWidth, bottomRailWidth, baseTrimHeight, verticalWidth, rows, denominator, unit = "in" } = input;
  const rowWidth = input.rowWidth ?? verticalWidth;
  check("wallWidth", wallWidth, false);
  check("wallHeight", wallHeight, false);
  check("topRailWidth", topRailWidth, true);
  check("bottomRailWidth", bottomRailWidth, true);
  check("baseTrimHeight", baseTrimHeight, true);
  check("verticalWidth", verticalWidth, false);
  check("rowWidth", rowWidth, false);
  if (!Number.isInteger(rows) || rows < 0) throw new RangeError("rows must be a whole number, 0 or more");
  const s = (value: Length) => lengthText(value, denominator, unit);
  const warnings: Warning[] = [];

  const railsBottom = baseTrimHeight.add(bottomRailWidth);
  const railsTop = wallHeight.sub(topRailWidth);
  const verticalLength = railsTop.sub(railsBottom);
  if (verticalLength.compare(0) <= 0) throw new RangeError("the rails and base trim leave no height for the verticals");

  const verticalLayout = evenSpacing({
    span: wallWidth,
    memberWidth: verticalWidth,
    count: input.verticalCount,
    maxGap: input.maxBay,
    endCondition: "members",
    denominator,
    unit,
  });
  warnings.push(...verticalLayout.warnings);
  const studs = studsAcross(wallWidth, input.studs, denominator);

  const verticals: VerticalPlacement[] = verticalLayout.members.map((member) => {
    const under = studsUnder(member.start, member.end, studs);
    return { ...member, studs: under, landsOnStud: under.length > 0 };
  });
  const bays: Bay[] = verticals.slice(1).map((right, i) => {
    const start = verticals[i].end;
    return { index: i + 1, start, end: right.start, studs: studsUnder(start, right.start, studs) };
  });

  const rowLayout = rows > 0 ? evenSpacing({ span: verticalLength, memberWidth: rowWidth, count: rows, endCondition: "gaps", denominator, unit }) : null;
  if (rowLayout) warnings.push(...rowLayout.warnings.map((w) => ({ ...w, message: `Rows: ${w.message}` })));
  const rowList: Row[] = (rowLayout?.members ?? []).map((member) => {
    const bottom = railsBottom.add(member.start);
    const top = railsBottom.add(member.end);
    return { index: member.index, bottom, top, bottomMark: roundTo(bottom, denominator), topMark: roundTo(top, denominator), centerMark: roundTo(railsBottom.add(member.center), denominator) };
  });
  const panelHeight = roundTo(rowLayout ? rowLayout.gap : verticalLength, denominator);

  const trim = input.trim ?? ZERO;
  const longest = input.stock.reduce((a, b) => (b.length.compare(a) > 0 ? b.length : a), ZERO).sub(trim);
  if (longest.compare(0) <= 0) throw new RangeError("every stock length is used up by the trim");
  const top = railPlan("top rail", topRailWidth, railsTop, wallWidth, longest, studs, denominator);
  const bottom = railPlan("bottom rail", bottomRailWidth, baseTrimHeight, wallWidth, longest, studs, denominator);
  for (const rail of [top, bottom]) {
    if (rail.width.n === 0n || rail.pieces.length === 1) continue;
    const where =
      studs.length === 0
        ? "Join each seam over a stud."
        : rail.jointsOnStuds
          ? "Each joint falls on a stud centre."
          : "No stud lies where the joints must go: glue and pin them, or add blocking.";
    warnings.push({
      code: "rail-split",
      message: `The ${rail.label} is longer than the longest stock, so it is cut in ${rail.pieces.length} pieces (${rail.pieces.map(s).join(", ")}). ${where} A scarf joint hides the seam best.`,
    });
  }

  const missed = verticals.filter((v) => !v.landsOnStud);
  if (studs.length > 0 && missed.length > 0) {
    const which = missed.map((v) => v.index).join(", ");
    warnings.push({
      code: "misses-studs",
      message: `Vertical${missed.length > 1 ? "s" : ""} ${which} miss${missed.length > 1 ? "" : "es"} every stud: nail at an angle into the plate, or glue and pin.`,
    });
  }
  const openBays = rows > 0 ? bays.filter((bay) => bay.studs.length === 0) : [];
  if (studs.length > 0 && openBays.length > 0) {
    warnings.push({
      code: "row-misses-studs",
      message: `The row rails in bay${openBays.length > 1 ? "s" : ""} ${openBays.map((b) => b.index).join(", ")} cross no stud: glue them and pin them at an angle into the verticals.`,
    });
  }

  const pieces: GridPiece[] = [];
  for (const [rail, kind] of [[top, "top-rail"], [bottom, "bottom-rail"]] as const) {
    if (rail.width.n === 0n) continue;
    for (const length of rail.pieces) pieces.push({ label: rail.label, length, quantity: 1, memberWidth: rail.width, kind });
  }
  if (verticals.length > 0) pieces.push({ label: "vertical", length: verticalLength, quantity: verticals.length, memberWidth: verticalWidth, kind: "vertical" });
  if (rowList.length > 0 && bays.length > 0 && verticalLayout.gap.compare(0) > 0) {
    pieces.push({ label: "row rail", length: verticalLayout.gap, quantity: bays.length * rows, memberWidth: rowWidth, kind: "row-rail" });
  }
  const grouped = groupPieces(pieces);

  const widths: Length[] = [];
  for (const piece of grouped) if (!widths.some((w) => w.equals(piece.memberWidth))) widths.push(piece.memberWidth);
  const cutLists: GridCutList[] = widths.map((memberWidth) => {
    const group = grouped.filter((piece) => piece.memberWidth.equals(memberWidth));
    const result = cutList({ pieces: group.map(({ label, length, quantity }) => ({ label, length, quantity })), stock: input.stock, kerf: input.kerf, trim, unit, denominator });
    warnings.push(...result.warnings.map((w) => ({ ...w, message: `${s(memberWidth)} wide stock: ${w.message}` })));
    return { memberWidth, pieces: group, result };
  });

  return {
    denominator,
    wallWidth,
    wallHeight,
    verticalLength: roundTo(verticalLength, denominator),
    bay: roundTo(verticalLayout.gap, denominator),
    verticalLayout,
    verticals,
    bays,
    panelHeight,
    rows: rowList,
    rails: { top, bottom },
    studs,
    pieces: grouped,
    cutLists,
    boardCount: cutLists.reduce((total, list) => total + list.result.boardCount, 0),
    warnings,
  };
}
