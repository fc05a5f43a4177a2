// Even spacing: members across a span with equal gaps. The free space (span minus the
// members) is divided by the number of SPACES, never the number of members, and every
// mark is the exact cumulative position rounded once, so rounding never piles up.
import { Fraction, ZERO, gt, lt, roundTo, type Length, type Rounded, type Unit, type Warning } from "./core";
import { formatMeasure } from "./measure";

/**
 * `members`: a member flush at each end of the span (battens on a wall), spaces = count − 1.
 * `gaps`: a gap at each end, as between two posts (balusters), spaces = count + 1.
 */
export type EndCondition = "members" | "gaps";

export type EvenSpacingInput = {
  span: Length;
  memberWidth: Length;
  /** Exactly one of `count` and `maxGap`. */
  count?: number;
  maxGap?: Length;
  endCondition: EndCondition;
  denominator: number;
  /** Only for the numbers inside warning messages; the engine itself works in inches. */
  unit?: Unit;
};

export type MemberMarks = {
  /** 1-based, counted from the left end of the span. */
  index: number;
  start: Length;
  center: Length;
  end: Length;
  startMark: Rounded;
  centerMark: Rounded;
  endMark: Rounded;
};

export type EvenSpacingResult = {
  endCondition: EndCondition;
  denominator: number;
  span: Length;
  memberWidth: Length;
  count: number;
  spaces: number;
  totalMemberWidth: Length;
  /** span − all the members; negative when they do not fit. */
  freeSpace: Length;
  /** The exact clear gap between neighbours (and at the ends for `gaps`). */
  gap: Length;
  /** Exact centre-to-centre distance, gap + member width. */
  onCenter: Length;
  roundedGap: Rounded;
  roundedOnCenter: Rounded;
  /** Empty when the members do not fit (warning `no-room`). */
  members: MemberMarks[];
  /**
   * Where the far end lands, past (+) or short of (−) the true end, if you hook the tape
   * on the last mark each time and add the rounded gap plus the member width instead of
   * measuring every mark from the left end: spaces × (rounded gap − exact gap).
   */
  driftIfGapsAdded: Length;
  warnings: Warning[];
};

/** Under this a gap is too narrow to clean, paint or fit a finger into. */
export const TINY_GAP = new Fraction(1, 4);

export function spacesFor(count: number, endCondition: EndCondition): number {
  return endCondition === "members" ? count - 1 : count + 1;
}

/**
 * The fewest members so that every gap is at most `maxGap` (a gap exactly at the maximum
 * is allowed). From (span − n·w) / spaces ≤ g, solved for n.
 */
export function fewestMembersForMaxGap(span: Length, memberWidth: Length, maxGap: Length, endCondition: EndCondition): number {
  const pitch = memberWidth.add(maxGap);
  if (endCondition === "members") {
    const needed = span.add(maxGap).div(pitch).ceil();
    return Math.max(2, Number(needed.valueOf()));
  }
  const needed = span.sub(maxGap).div(pitch).ceil();
  return Math.max(1, Number(needed.valueOf()));
}

function checkLength(name: string, value: Length, allowZero: boolean) {
  const bad = allowZero ? value.s < 0n : value.s < 0n || value.n === 0n;
  if (bad) throw new RangeError(`${name} must be ${allowZero ? "zero or more" : "more than zero"}, got ${value.toString()}`);
}

export function lengthText(value: Length, denominator: number, unit: Unit = "in"): string {
  return formatMeasure(value, { denominator, unit }).text;
}

/**
 * The layout itself, for a count already decided. Shared with guard spacing, which may
 * need no baluster at all (count 0 with gaps at the ends), so it allows what the public
 * even-spacing contract does not.
 */
export function layOutMembers(
  span: Length,
  memberWidth: Length,
  count: number,
  endCondition: EndCondition,
  denominator: number,
  unit: Unit = "in",
): EvenSpacingResult {
  const spaces = spacesFor(count, endCondition);
  const totalMemberWidth = memberWidth.mul(count);
  const freeSpace = span.sub(totalMemberWidth);
  const gap = freeSpace.div(spaces);
  const onCenter = gap.add(memberWidth);
  const roundedGap = roundTo(gap, denominator);
  const warnings: Warning[] = [];
  const fits = freeSpace.s >= 0n;

  const members: MemberMarks[] = [];
  if (fits) {
    const firstStart = endCondition === "members" ? ZERO : gap;
    const halfWidth = memberWidth.div(2);
    for (let index = 1; index <= count; index++) {
      const start = firstStart.add(onCenter.mul(index - 1));
      const center = start.add(halfWidth);
      const end = start.add(memberWidth);
      members.push({
        index,
        start,
        center,
        end,
        startMark: roundTo(start, denominator),
        centerMark: roundTo(center, denominator),
        endMark: roundTo(end, denominator),
      });
    }
  } else {
    warnings.push({
      code: "no-room",
      message: `${count} members of ${lengthText(memberWidth, denominator, unit)} need ${lengthText(totalMemberWidth, denominator, unit)}, more than the ${lengthText(span, denominator, unit)} span. Use fewer or narrower members.`,
    });
  }

  if (fits && freeSpace.n === 0n && count > 0) {
    warnings.push({ code: "no-gap", message: "The members fill the whole span: there is no gap between them." });
  } else if (fits && lt(gap, TINY_GAP)) {
    warnings.push({
      code: "tiny-gap",
      message: `The gap is only ${lengthText(gap, 64, unit)}, under ${lengthText(TINY_GAP, denominator, unit)}: too narrow to paint or clean. Use fewer members.`,
    });
  }

  const driftIfGapsAdded = roundedGap.error.mul(spaces);
  return {
    endCondition,
    denominator,
    span,
    memberWidth,
    count,
    spaces,
    totalMemberWidth,
    freeSpace,
    gap,
    onCenter,
    roundedGap,
    roundedOnCenter: roundTo(onCenter, denominator),
    members,
    driftIfGapsAdded,
    warnings,
  };
}

export function evenSpacing(input: EvenSpacingInput): EvenSpacingResult {
  const { span, memberWidth, count, maxGap, endCondition, denominator, unit = "in" } = input;
  checkLength("span", span, false);
  checkLength("memberWidth", memberWidth, true);
  if ((count === undefined) === (maxGap === undefined)) throw new RangeError("give exactly one of count and maxGap");
  if (maxGap !== undefined) checkLength("maxGap", maxGap, false);

  const minimum = endCondition === "members" ? 2 : 1;
  const members = count ?? fewestMembersForMaxGap(span, memberWidth, maxGap!, endCondition);
  if (!Number.isInteger(members) || members < minimum) {
    throw new RangeError(`count must be a whole number of at least ${minimum} when the end condition is "${endCondition}", got ${members}`);
  }

  const result = layOutMembers(span, memberWidth, members, endCondition, denominator, unit);
  const { warnings } = result;
  // The exact gap is never over the maximum (the count was chosen for it), but the number a
  // student reads off the rounded gap can be, and that is the number they will check.
  if (maxGap !== undefined && result.members.length > 0 && gt(result.roundedGap.rounded, maxGap)) {
    warnings.push({
      code: "rounded-gap-over-max",
      message: `Rounded, the gap reads ${lengthText(result.roundedGap.rounded, denominator, unit)}, over the ${lengthText(maxGap, denominator, unit)} maximum; the exact gap is under it. Mark every position from the left end.`,
    });
  }
  const oneGraduation = new Fraction(1, denominator);
  if (result.members.length > 0 && result.driftIfGapsAdded.abs().compare(oneGraduation) >= 0) {
    const direction = result.driftIfGapsAdded.s < 0n ? "short" : "past the end";
    warnings.push({
      code: "rounding-drift",
      message: `Adding the rounded gap ${result.spaces} times would land ${lengthText(result.driftIfGapsAdded.abs(), 64, unit)} ${direction}. Measure every mark from the left end instead.`,
    });
  }
  return result;
}
