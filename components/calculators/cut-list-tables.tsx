import type { Fraction } from "@/lib/layout/core";
import type { CutListResult } from "@/lib/layout/cut-list";
import { lengthText, type Display } from "./readouts";

const money = new Intl.NumberFormat("en-US", { style: "currency", currency: "USD" });
export const priceText = (price: number) => money.format(price);

const th = "px-3 py-2";
const td = "px-3 py-1.5";

/** What to carry out of the lumberyard: a count per stock length, and the cost when every board is priced. */
export function BuyTable({ result, display, caption = "Boards to buy" }: { result: CutListResult; display: Display; caption?: string }) {
  const priced = result.totalCost !== undefined;
  return (
    <div className="card overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="px-3 pt-2 text-left text-sm font-semibold">{caption}</caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            <th scope="col" className={th}>
              Stock
            </th>
            <th scope="col" className={th}>
              Boards
            </th>
            {priced ? (
              <>
                <th scope="col" className={th}>
                  Each
                </th>
                <th scope="col" className={th}>
                  Cost
                </th>
              </>
            ) : null}
          </tr>
        </thead>
        <tbody className="measure">
          {result.byStock.map((row) => (
            <tr key={row.stockIndex} className="border-b border-rule last:border-0">
              <th scope="row" className={td}>
                {lengthText(row.stockLength, display, "feet-inches")}
              </th>
              <td className={td}>{row.count}</td>
              {priced ? (
                <>
                  <td className={td}>{priceText(row.price ?? 0)}</td>
                  <td className={td}>{priceText((row.price ?? 0) * row.count)}</td>
                </>
              ) : null}
            </tr>
          ))}
        </tbody>
        <tfoot className="measure border-t border-rule-strong font-semibold">
          <tr>
            <th scope="row" className={td}>
              Total
            </th>
            <td className={td}>{result.boardCount}</td>
            {priced ? (
              <>
                <td className={td} />
                <td className={td}>{priceText(result.totalCost!)}</td>
              </>
            ) : null}
          </tr>
        </tfoot>
      </table>
    </div>
  );
}

/** Fewest boards proven, or only a good plan: the student should know which. */
export function CutListVerdict({ result }: { result: CutListResult }) {
  if (result.boardCount === 0) return null;
  const fewest = result.boardCount === result.lowerBound;
  const plural = (n: number) => `${n} board${n === 1 ? "" : "s"}`;
  const [heading, text] = result.optimal
    ? ["Proven fewest boards.", `No plan cuts these pieces from fewer than ${plural(result.boardCount)}${result.totalCost !== undefined ? ", and none with as few costs less" : ""}.`]
    : fewest
      ? ["Fewest boards.", `${plural(result.boardCount)} is the least possible, though another mix of stock lengths may waste less.`]
      : ["Good, not proven.", `This plan uses ${plural(result.boardCount)}; no plan can use fewer than ${result.lowerBound}, but the search did not prove ${result.boardCount} is the fewest.`];
  return (
    <p data-verdict={result.optimal ? "proven" : "not-proven"} className={`rounded border-l-4 px-3 py-2 text-sm ${result.optimal ? "border-ok bg-ok-bg" : "border-rule-strong bg-paper-sunk"}`}>
      <strong>{heading}</strong> {text} Waste {result.wastePercent.toFixed(1)}% (kerfs, end trim and offcuts).
    </p>
  );
}

type BoardGroup = { first: number; last: number; board: CutListResult["boards"][number] };

/** Boards cut alike, side by side in the plan, share one line: "1–5 · 8' · vertical 83 1/2" × 5". */
function groupAlike(boards: CutListResult["boards"]): BoardGroup[] {
  const same = (a: BoardGroup["board"], b: BoardGroup["board"]) =>
    a.stockIndex === b.stockIndex && a.cuts.length === b.cuts.length && a.cuts.every((cut, i) => cut.label === b.cuts[i].label && cut.length.equals(b.cuts[i].length));
  const groups: BoardGroup[] = [];
  boards.forEach((board, i) => {
    const last = groups[groups.length - 1];
    if (last && same(last.board, board)) last.last = i + 1;
    else groups.push({ first: i + 1, last: i + 1, board });
  });
  return groups;
}

/** One line per kind of board: where a crew member ticks off each board as it is cut. */
export function BoardsSummaryTable({ result, display, caption = "Cuts from each board" }: { result: CutListResult; display: Display; caption?: string }) {
  return (
    <div className="card overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="px-3 pt-2 text-left text-sm font-semibold">{caption}</caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            <th scope="col" className={th}>
              Board
            </th>
            <th scope="col" className={th}>
              Stock
            </th>
            <th scope="col" className={th}>
              Cuts, in order
            </th>
            <th scope="col" className={th}>
              Offcut
            </th>
          </tr>
        </thead>
        <tbody>
          {groupAlike(result.boards).map(({ first, last, board }) => (
            <tr key={first} className="border-b border-rule align-top last:border-0">
              <th scope="row" className={`${td} measure whitespace-nowrap`}>
                {first === last ? first : `${first}–${last}`}
              </th>
              <td className={`${td} measure whitespace-nowrap`}>
                {lengthText(board.stockLength, display, "feet-inches")}
                {last > first ? <span className="font-sans text-ink-soft"> × {last - first + 1}</span> : null}
              </td>
              <td className={td}>
                {board.cuts.map((cut, c) => (
                  <span key={c} className="mr-3 inline-block whitespace-nowrap">
                    <span className="measure">{c + 1}.</span> {cut.label || "piece"} <span className="measure">{lengthText(cut.length, display)}</span>
                  </span>
                ))}
              </td>
              <td className={`${td} measure whitespace-nowrap`}>{board.offcut.n === 0n ? "none" : lengthText(board.offcut, display)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/**
 * A table per board (boards cut alike share one), the cuts in order with where to mark each
 * one from the board's factory end: trim, then each piece plus the kerfs before it, so the
 * tape stays hooked on one end.
 */
export function BoardCutTables({ result, display, trim, kerf }: { result: CutListResult; display: Display; trim: Fraction; kerf: Fraction }) {
  return (
    <div className="space-y-2">
      <p className="text-xs text-ink-soft">
        Hook the tape on the board&apos;s end and mark every cut from there{kerf.n > 0n ? `; each mark includes the ${lengthText(kerf, display)} kerfs before it` : ""}. Saw on the offcut side
        of each line.
      </p>
      <div className="grid items-start gap-3 md:grid-cols-2 print:grid-cols-2">
        {groupAlike(result.boards).map(({ first, last, board }) => (
          <div key={first} className="card overflow-x-auto print:break-inside-avoid" data-board-table={first}>
            <table className="w-full text-left text-sm">
              <caption className="px-3 pt-2 text-left text-sm font-semibold">
                {first === last ? `Board ${first}` : `Boards ${first}–${last} (${last - first + 1} alike)`} — {lengthText(board.stockLength, display, "feet-inches")} stock
                {board.price !== undefined ? `, ${priceText(board.price)}${first === last ? "" : " each"}` : ""}
              </caption>
              <thead className="border-b border-rule bg-paper-sunk">
                <tr>
                  <th scope="col" className={th}>
                    Cut
                  </th>
                  <th scope="col" className={th}>
                    Piece
                  </th>
                  <th scope="col" className={th}>
                    Length
                  </th>
                  <th scope="col" className={th}>
                    Mark at
                  </th>
                </tr>
              </thead>
              <tbody className="[&_.measure]:whitespace-nowrap">
                {trim.n > 0n ? (
                  <tr className="border-b border-rule text-ink-soft">
                    <th scope="row" className={`${td} measure`}>
                      0
                    </th>
                    <td className={td}>end trim</td>
                    <td className={`${td} measure`}>{lengthText(trim, display)}</td>
                    <td className={`${td} measure`}>{lengthText(trim, display)}</td>
                  </tr>
                ) : null}
                {board.cuts.map((cut, c) => (
                  <tr key={c} className="border-b border-rule last:border-0">
                    <th scope="row" className={`${td} measure`}>
                      {c + 1}
                    </th>
                    <td className={td}>{cut.label || "piece"}</td>
                    <td className={`${td} measure`}>{lengthText(cut.length, display)}</td>
                    <td className={`${td} measure`}>{lengthText(trim.add(cut.start).add(cut.length), display)}</td>
                  </tr>
                ))}
                <tr className="text-ink-soft">
                  <th scope="row" className={td}>
                    left
                  </th>
                  <td className={td}>offcut</td>
                  <td className={`${td} measure`}>{board.offcut.n === 0n ? "none" : lengthText(board.offcut, display)}</td>
                  <td className={td} />
                </tr>
              </tbody>
            </table>
          </div>
        ))}
      </div>
    </div>
  );
}
