// Tape, fraction, lumber, cut-list and stair problem kinds.
import { fractionArithmetic } from "./fraction-arithmetic";
import { lumberBoardFeet } from "./lumber-board-feet";
import { stairRisers } from "./stair-risers";
import { stockBoards } from "./stock-boards";
import { tapeReading } from "./tape-reading";
import type { AnyProblemKind } from "./types";

export const STOCK_KINDS: AnyProblemKind[] = [tapeReading, fractionArithmetic, lumberBoardFeet, stockBoards, stairRisers];
