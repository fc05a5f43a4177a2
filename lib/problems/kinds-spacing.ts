// Spacing, marking, guard and wall-grid problem kinds.
import { battenLength } from "./batten-length";
import { bayRail } from "./bay-rail";
import { evenGap } from "./even-gap";
import { fewestMembers } from "./fewest-members";
import { markPosition } from "./mark-position";
import type { AnyProblemKind } from "./types";

export const SPACING_KINDS: AnyProblemKind[] = [evenGap, markPosition, fewestMembers, battenLength, bayRail];
