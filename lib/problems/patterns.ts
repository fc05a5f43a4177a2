// The slips a layout student makes, in the product's own names. Kinds diagnose a wrong answer
// as one of these; feedback and the instructor's charts speak of them by these words.

export type ErrorPatternInfo = {
  key: string;
  /** Short name for charts and badges. */
  name: string;
  /** What the student probably did, said to the student. */
  feedback: string;
  /** The lesson section that teaches the point: /lessons/{slug}#{section}. */
  lesson: { slug: string; section?: string };
};

const list = [
  {
    key: "divided-by-members",
    name: "Divided by members",
    feedback: "It looks like you divided the free space by the number of members. Divide by the number of spaces: members − 1 with a member at each end, members + 1 between two posts.",
    lesson: { slug: "even-spacing", section: "count-the-spaces-not-the-members" },
  },
  {
    key: "forgot-member-width",
    name: "Forgot member width",
    feedback: "It looks like you divided the whole span without first taking out the width of the members. Subtract the members, then divide what is left.",
    lesson: { slug: "even-spacing", section: "the-formula" },
  },
  {
    key: "on-center-for-gap",
    name: "On centre for gap",
    feedback: "That is the on-centre spacing (gap plus one member), not the clear gap — or the other way round. Read which one the question asks for.",
    lesson: { slug: "even-spacing" },
  },
  {
    key: "added-rounded-gaps",
    name: "Added rounded gaps",
    feedback: "That is what you get by adding rounded gaps one after another, so the rounding piles up. Work the exact position from the left end and round once.",
    lesson: { slug: "mark-from-one-end", section: "why-adding-rounded-gaps-drifts" },
  },
  {
    key: "rounded-wrong-way",
    name: "Rounded the wrong way",
    feedback: "Close: that is the neighbouring graduation. Round to the nearest one; a value exactly halfway goes up.",
    lesson: { slug: "fractions-for-layout", section: "exactly-midway" },
  },
  {
    key: "wrong-precision",
    name: "Wrong precision",
    feedback: "That is rounded to a coarser graduation than the question asks for. Round to the precision asked.",
    lesson: { slug: "fractions-for-layout", section: "the-rounding-error" },
  },
  {
    key: "feet-inches-mixup",
    name: "Feet and inches mixed up",
    feedback: "Feet and inches look mixed up: there are 12 inches in a foot, not 10. Convert everything to inches before you work.",
    lesson: { slug: "fractions-for-layout", section: "feet-and-inches" },
  },
  {
    key: "forgot-kerf",
    name: "Forgot kerf",
    feedback: "The saw blade turns every cut into sawdust. Allow one kerf for each cut when you fit pieces into a board.",
    lesson: { slug: "cut-lists-and-stock", section: "kerf-the-wood-the-saw-turns-to-dust" },
  },
  {
    key: "forgot-trim-deduction",
    name: "Forgot trim deduction",
    feedback: "The vertical runs between the rails, above the base trim. Subtract the rails and the base from the wall height.",
    lesson: { slug: "board-and-batten-wall", section: "the-vertical-cut-length" },
  },
  {
    key: "counted-members-not-spaces",
    name: "Counted members for spaces",
    feedback: "That is the number of members, not spaces (or the reverse). Count the spaces between them.",
    lesson: { slug: "even-spacing", section: "count-the-spaces-not-the-members" },
  },
  {
    key: "rounded-count-down",
    name: "Rounded a count down",
    feedback: "A count that must keep a gap or a riser under a limit always rounds up: a fraction of a member or riser means one more.",
    lesson: { slug: "even-spacing", section: "count-the-spaces-not-the-members" },
  },
  {
    key: "nominal-for-actual",
    name: "Nominal for actual",
    feedback: "That uses the nominal size (the name of the board). A dressed board is smaller: use its actual size.",
    lesson: { slug: "lumber-sizes", section: "the-name-is-not-the-size" },
  },
  {
    key: "miscounted-graduations",
    name: "Miscounted graduations",
    feedback: "Count the small marks again from the last inch mark, and reduce the fraction.",
    lesson: { slug: "reading-a-tape", section: "reading-a-mark-step-by-step" },
  },
  {
    key: "treads-equal-risers",
    name: "As many treads as risers",
    feedback: "A straight flight has one tread fewer than it has risers: the top riser lands on the upper floor.",
    lesson: { slug: "stair-layout", section: "treads-and-run" },
  },
  {
    key: "centre-for-edge",
    name: "Centre for edge",
    feedback: "That is the member's centre, not its edge (or the reverse): the edge is half a member width from the centre.",
    lesson: { slug: "mark-from-one-end", section: "why-adding-rounded-gaps-drifts" },
  },
  {
    key: "misnamed-graduations",
    name: "Misnamed graduations",
    feedback: "You counted the marks but named them the wrong size. Name each tick by its length: on a sixteenths tape the shortest lines are sixteenths, not eighths.",
    lesson: { slug: "reading-a-tape", section: "one-inch-sixteen-parts" },
  },
  {
    key: "actual-for-board-feet",
    name: "Actual size for board feet",
    feedback: "Board feet are figured on the nominal size: a 2x6 counts as 2\" by 6\", and stock under 1\" thick counts as 1\". The actual size is for layout, not for board measure.",
    lesson: { slug: "lumber-sizes", section: "board-feet" },
  },
] as const satisfies readonly ErrorPatternInfo[];

export type ErrorPattern = (typeof list)[number]["key"];

export const ERROR_PATTERNS: Readonly<Record<ErrorPattern, ErrorPatternInfo>> = Object.fromEntries(list.map((p) => [p.key, p])) as Record<ErrorPattern, ErrorPatternInfo>;

export function isErrorPattern(key: string): key is ErrorPattern {
  return key in ERROR_PATTERNS;
}
