// Guard (baluster) spacing: balusters between two posts, a gap at each end, and every
// opening STRICTLY under the limit, because the code test is a sphere that must not pass:
// an opening of exactly 4" lets a 4" sphere through.
import { Fraction, gte, type Length, type Unit, type Warning } from "./core";
import { layOutMembers, lengthText, type EvenSpacingResult } from "./spacing";

/** IRC 2018 R312.1.3: openings in a guard shall not allow a 4" sphere to pass. */
export const GUARD_MAX_OPENING = new Fraction(4);

export type GuardSpacingInput = {
  /** Clear distance between the posts. */
  span: Length;
  balusterWidth: Length;
  /** Defaults to 4" (IRC 2018 R312.1.3). */
  maxOpening?: Length;
  denominator: number;
  unit?: Unit;
};

export type GuardOpening = { index: number; start: Length; end: Length; width: Length };

export type GuardSpacingResult = EvenSpacingResult & {
  maxOpening: Length;
  /** Every clear opening from post to post, left to right (count + 1 of them). */
  openings: GuardOpening[];
  /** What a count of one baluster fewer would leave, to show why it fails; null at zero. */
  oneFewer: { count: number; opening: Length } | null;
  limitNote: string;
};

/**
 * The fewest balusters n with (span − n·w) / (n + 1) < limit. Rearranged:
 * n > (span − limit) / (w + limit), so n is the next whole number above that quotient
 * (one more than its floor, which also handles a quotient that is already whole).
 */
export function fewestBalusters(span: Length, balusterWidth: Length, maxOpening: Length): number {
  const quotient = span.sub(maxOpening).div(balusterWidth.add(maxOpening));
  return Math.max(0, Number(quotient.floor().valueOf()) + 1);
}

export function guardSpacing(input: GuardSpacingInput): GuardSpacingResult {
  const { span, balusterWidth, denominator, unit = "in" } = input;
  const maxOpening = input.maxOpening ?? GUARD_MAX_OPENING;
  if (span.s < 0n || span.n === 0n) throw new RangeError("span must be more than zero");
  if (balusterWidth.s < 0n || balusterWidth.n === 0n) throw new RangeError("balusterWidth must be more than zero");
  if (maxOpening.s < 0n || maxOpening.n === 0n) throw new RangeError("maxOpening must be more than zero");

  const count = fewestBalusters(span, balusterWidth, maxOpening);
  const layout = layOutMembers(span, balusterWidth, count, "gaps", denominator, unit);
  const warnings: Warning[] = [...layout.warnings];

  const openings: GuardOpening[] = [];
  if (layout.members.length === count) {
    let start = new Fraction(0);
    for (const member of layout.members) {
      openings.push({ index: openings.length + 1, start, end: member.start, width: member.start.sub(start) });
      start = member.end;
    }
    openings.push({ index: openings.length + 1, start, end: span, width: span.sub(start) });
  }

  if (count === 0) {
    warnings.push({
      code: "no-baluster-needed",
      message: `The span of ${lengthText(span, denominator, unit)} is already under the ${lengthText(maxOpening, denominator, unit)} limit: no baluster is needed.`,
    });
  }
  // A gap that rounds up to the limit reads as "exactly 4 inches" on the tape and will be
  // questioned by an inspector, even though the exact opening is under it.
  if (openings.length > 0 && gte(layout.roundedGap.rounded, maxOpening)) {
    warnings.push({
      code: "rounded-opening-at-limit",
      message: `Rounded, the opening reads ${lengthText(layout.roundedGap.rounded, denominator, unit)}, not under the ${lengthText(maxOpening, denominator, unit)} limit. Mark from the exact positions or add a baluster.`,
    });
  }

  const oneFewer =
    count === 0 ? null : { count: count - 1, opening: span.sub(balusterWidth.mul(count - 1)).div(count) };

  const limitText = lengthText(maxOpening, denominator, unit);
  const limitNote =
    `Every opening must be under ${limitText}: a ${limitText} sphere must not pass through (IRC 2018 R312.1.3). ` +
    `An opening of exactly ${limitText} fails, so one more baluster is added. ` +
    `Check your local code: the open side of a stair allows ${lengthText(new Fraction(35, 8), denominator, unit)} and the triangle under it ${lengthText(new Fraction(6), denominator, unit)}.`;

  return { ...layout, warnings, maxOpening, openings, oneFewer, limitNote };
}
