import type { Fraction } from "@/lib/layout/core";
import type { BoardPlan, CutListResult } from "@/lib/layout/cut-list";
import { lengthText, type Display } from "./readouts";
import { NarrowOrWide } from "./narrow-or-wide";

const WIDE = 640;
/** A phone draws on a narrower canvas, so the same label sizes read larger. */
const NARROW = 360;
const LEFT = 8;
const RIGHT = 8;
const BAR = 24;
const ROW = 44;
/** Past this many boards the drawing would run off the printed page; the tables still list them all. */
export const MAX_DRAWN_BOARDS = 40;

function cutText(board: BoardPlan, display: Display): string {
  const cuts = board.cuts.map((cut, i) => `cut ${i + 1}, ${cut.label || "piece"} ${lengthText(cut.length, display)}`).join("; ");
  const offcut = board.offcut.n === 0n ? "no offcut" : `offcut ${lengthText(board.offcut, display)}`;
  return `${cuts}; ${offcut}`;
}

export function boardsDescription(result: CutListResult, display: Display, trim: Fraction): string {
  if (result.boards.length === 0) return "No boards: there is nothing to cut.";
  const start = trim.n === 0n ? "" : `Each board first loses ${lengthText(trim, display)} off its end. `;
  const boards = result.boards.slice(0, MAX_DRAWN_BOARDS).map((board, i) => `Board ${i + 1}, ${lengthText(board.stockLength, display, "feet-inches")} stock: ${cutText(board, display)}.`);
  const more = result.boards.length > MAX_DRAWN_BOARDS ? ` ${result.boards.length - MAX_DRAWN_BOARDS} more boards are listed in the tables.` : "";
  return `${result.boardCount} board${result.boardCount === 1 ? "" : "s"} drawn to scale, cuts numbered in the order they are made from the left end. ${start}${boards.join(" ")}${more}`;
}

/**
 * Each board as a bar drawn to one scale, so a short board looks short: the cuts in order
 * from the left end, the kerfs as dark lines, the trimmed end shaded and the offcut hatched.
 */
export function CutListBoards({ result, display, trim, idPrefix }: { result: CutListResult; display: Display; trim: Fraction; idPrefix: string }) {
  const description = boardsDescription(result, display, trim);
  return (
    <NarrowOrWide
      wide={<BoardsCanvas result={result} display={display} trim={trim} description={description} idPrefix={idPrefix} narrow={false} />}
      narrow={<BoardsCanvas result={result} display={display} trim={trim} description={description} idPrefix={`${idPrefix}-narrow`} narrow />}
    />
  );
}

type CanvasProps = { result: CutListResult; display: Display; trim: Fraction; description: string; idPrefix: string; narrow: boolean };

/** One canvas; the description is worked out once for both. */
function BoardsCanvas({ result, display, trim, description, idPrefix, narrow }: CanvasProps) {
  const WIDTH = narrow ? NARROW : WIDE;
  // On a phone the labels grow a little more than the canvas shrinks them.
  const titleSize = narrow ? 11.5 : 10;
  const cutSize = narrow ? 10.5 : 9.5;
  const charWidth = cutSize * 0.6;
  const boards = result.boards.slice(0, MAX_DRAWN_BOARDS);
  const longest = Math.max(1, ...boards.map((b) => b.stockLength.valueOf()));
  const scale = (WIDTH - LEFT - RIGHT) / longest;
  const height = Math.max(ROW, boards.length * ROW + 6);
  const trimWidth = trim.valueOf() * scale;

  return (
    <figure className="card overflow-hidden p-2 print:break-inside-avoid">
      <svg viewBox={`0 0 ${WIDTH} ${height}`} role="img" aria-labelledby={`${idPrefix}-title ${idPrefix}-desc`} className="w-full">
        <title id={`${idPrefix}-title`}>Boards and their cuts</title>
        <desc id={`${idPrefix}-desc`}>{description}</desc>
        <defs>
          <pattern id={`${idPrefix}-offcut`} width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <rect width="6" height="6" className="fill-paper-sunk" />
            <line x1="0" y1="0" x2="0" y2="6" strokeWidth="1.4" className="stroke-ink-faint" />
          </pattern>
        </defs>
        {boards.map((board, b) => {
          const top = b * ROW + 18;
          const x0 = LEFT;
          const barWidth = board.stockLength.valueOf() * scale;
          const offcutWidth = board.offcut.valueOf() * scale;
          return (
            <g key={b} data-board={b + 1}>
              <text x={x0} y={top - 5} fontSize={titleSize} className="fill-ink font-semibold">
                Board {b + 1} · {lengthText(board.stockLength, display, "feet-inches")}
                {board.offcut.n > 0n ? ` · offcut ${lengthText(board.offcut, display)}` : " · no offcut"}
              </text>
              <rect x={x0} y={top} width={barWidth} height={BAR} className="fill-ink-soft" />
              {trimWidth > 0 ? <rect x={x0} y={top} width={trimWidth} height={BAR} className="fill-ink-faint" /> : null}
              {board.cuts.map((cut, i) => {
                const cx = x0 + trimWidth + cut.start.valueOf() * scale;
                const w = cut.length.valueOf() * scale;
                const full = `${i + 1} ${cut.label || "piece"} ${lengthText(cut.length, display)}`;
                const short = `${i + 1} ${lengthText(cut.length, display)}`;
                const label = full.length * charWidth < w - 4 ? full : short.length * charWidth < w - 4 ? short : String(i + 1);
                return (
                  <g key={i}>
                    <rect x={cx} y={top} width={Math.max(0.8, w)} height={BAR} className="fill-paper-raised stroke-ink" strokeWidth={0.6} />
                    {label.length * charWidth < w + 2 ? (
                      <text x={cx + w / 2} y={top + BAR / 2 + 3.5} textAnchor="middle" fontSize={cutSize} className="fill-ink font-mono">
                        {label}
                      </text>
                    ) : null}
                  </g>
                );
              })}
              {offcutWidth > 0 ? <rect x={x0 + barWidth - offcutWidth} y={top} width={offcutWidth} height={BAR} fill={`url(#${idPrefix}-offcut)`} className="stroke-ink-faint" strokeWidth={0.6} /> : null}
              <rect x={x0} y={top} width={barWidth} height={BAR} fill="none" className="stroke-ink" strokeWidth={0.8} />
            </g>
          );
        })}
      </svg>
      <figcaption className="flex flex-wrap gap-x-4 gap-y-1 px-2 pt-1 text-xs text-ink-soft">
        <span className="flex items-center gap-1">
          <svg width="18" height="12" aria-hidden="true">
            <rect x="1" y="1" width="16" height="10" className="fill-paper-raised stroke-ink" strokeWidth={0.8} />
          </svg>
          piece, numbered in cutting order
        </span>
        <span className="flex items-center gap-1">
          <svg width="18" height="12" aria-hidden="true">
            <rect x="1" y="1" width="3" height="10" className="fill-ink-soft" />
          </svg>
          kerf (saw cut){trimWidth > 0 ? "; lighter: end trim" : ""}
        </span>
        <span className="flex items-center gap-1">
          <svg width="18" height="12" aria-hidden="true">
            <rect x="1" y="1" width="16" height="10" fill={`url(#${idPrefix}-offcut)`} className="stroke-ink-faint" />
          </svg>
          offcut
        </span>
        {result.boards.length > MAX_DRAWN_BOARDS ? <span>The first {MAX_DRAWN_BOARDS} boards are drawn; the tables list all {result.boards.length}.</span> : null}
      </figcaption>
    </figure>
  );
}
