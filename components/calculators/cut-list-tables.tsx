import type { Fraction } from "@/lib/layout/core";
import type { CutListResult } from "@/lib/layout/cut-list";
import { cell, DataTable, measureCell, rowLine } from "./data-table";
import { lengthText, type Display } from "./readouts";

// Made on first use: building a formatter loads locale data (tens of milliseconds on a phone), and
// most cut lists have no prices.
let money: Intl.NumberFormat | undefined;
export const priceText = (price: number) => (money ??= new Intl.NumberFormat("en-US", { style: "currency", currency: "USD" })).format(price);

/** What to carry out of the lumberyard: a count per stock length, and the cost when every board is priced. */
export function BuyTable({ result, display, caption = "Boards to buy" }: { result: CutListResult; display: Display; caption?: string }) {
  const priced = result.totalCost !== undefined;
  return (
    <DataTable
      caption={caption}
      columns={priced ? ["Stock", "Boards", "Each", "Cost"] : ["Stock", "Boards"]}
      bodyClassName="measure"
      foot={
        <tfoot className="measure border-t border-rule-strong font-semibold">
          <tr>
            <th scope="row" className={cell}>
              Total
            </th>
            <td className={cell}>{result.boardCount}</td>
            {priced ? (
              <>
                <td className={cell} />
                <td className={cell}>{priceText(result.totalCost!)}</td>
              </>
            ) : null}
          </tr>
        </tfoot>
      }
    >
      {result.byStock.map((row) => (
        <tr key={row.stockIndex} className={rowLine}>
          <th scope="row" className={cell}>
            {lengthText(row.stockLength, display, "feet-inches")}
          </th>
          <td className={cell}>{row.count}</td>
          {priced ? (
            <>
              <td className={cell}>{priceText(row.price ?? 0)}</td>
              <td className={cell}>{priceText((row.price ?? 0) * row.count)}</td>
            </>
          ) : null}
        </tr>
      ))}
    </DataTable>
  );
}

const VERDICT_WORDS = { proven: "proven fewest boards", fewest: "fewest boards", "not-proven": "good, not proven" } as const;

/**
 * Fewest boards proven, or only a good plan: the student should know which. `optimal` is the
 * search's proof; reaching the lower bound is a proof too, but only of the board count.
 */
export function cutListVerdict(result: CutListResult): { key: keyof typeof VERDICT_WORDS; words: string } {
  const key = result.optimal ? "proven" : result.boardCount === result.lowerBound ? "fewest" : "not-proven";
  return { key, words: VERDICT_WORDS[key] };
}

export function CutListVerdict({ result }: { result: CutListResult }) {
  if (result.boardCount === 0) return null;
  const { key, words } = cutListVerdict(result);
  const plural = (n: number) => `${n} board${n === 1 ? "" : "s"}`;
  const text =
    key === "proven"
      ? `No plan cuts these pieces from fewer than ${plural(result.boardCount)}${result.totalCost !== undefined ? ", and none with as few costs less" : ""}.`
      : key === "fewest"
        ? `${plural(result.boardCount)} is the least possible, though another mix of stock lengths may waste less.`
        : `This plan uses ${plural(result.boardCount)}; no plan can use fewer than ${result.lowerBound}, but the search did not prove ${result.boardCount} is the fewest.`;
  return (
    <p data-verdict={result.optimal ? "proven" : "not-proven"} className={`rounded border-l-4 px-3 py-2 text-sm ${result.optimal ? "border-ok bg-ok-bg" : "border-rule-strong bg-paper-sunk"}`}>
      <strong>{words[0].toUpperCase() + words.slice(1)}.</strong> {text} Waste {result.wastePercent.toFixed(1)}% (kerfs, end trim and offcuts).
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
    <DataTable caption={caption} columns={["Board", "Stock", "Cuts, in order", "Offcut"]}>
      {groupAlike(result.boards).map(({ first, last, board }) => (
        <tr key={first} className={`${rowLine} align-top`}>
          <th scope="row" className={measureCell}>
            {first === last ? first : `${first}–${last}`}
          </th>
          <td className={measureCell}>
            {lengthText(board.stockLength, display, "feet-inches")}
            {last > first ? <span className="font-sans text-ink-soft"> × {last - first + 1}</span> : null}
          </td>
          <td className={cell}>
            {board.cuts.map((cut, c) => (
              <span key={c} className="mr-3 inline-block whitespace-nowrap">
                <span className="measure">{c + 1}.</span> {cut.label || "piece"} <span className="measure">{lengthText(cut.length, display)}</span>
              </span>
            ))}
          </td>
          <td className={measureCell}>{board.offcut.n === 0n ? "none" : lengthText(board.offcut, display)}</td>
        </tr>
      ))}
    </DataTable>
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
          <DataTable
            key={first}
            className="print:break-inside-avoid"
            data={{ "data-board-table": first }}
            caption={
              <>
                {first === last ? `Board ${first}` : `Boards ${first}–${last} (${last - first + 1} alike)`} — {lengthText(board.stockLength, display, "feet-inches")} stock
                {board.price !== undefined ? `, ${priceText(board.price)}${first === last ? "" : " each"}` : ""}
              </>
            }
            columns={["Cut", "Piece", "Length", "Mark at"]}
            bodyClassName="[&_.measure]:whitespace-nowrap"
          >
            {trim.n > 0n ? (
              <tr className="border-b border-rule text-ink-soft">
                <th scope="row" className={`${cell} measure`}>
                  0
                </th>
                <td className={cell}>end trim</td>
                <td className={`${cell} measure`}>{lengthText(trim, display)}</td>
                <td className={`${cell} measure`}>{lengthText(trim, display)}</td>
              </tr>
            ) : null}
            {board.cuts.map((cut, c) => (
              <tr key={c} className={rowLine}>
                <th scope="row" className={`${cell} measure`}>
                  {c + 1}
                </th>
                <td className={cell}>{cut.label || "piece"}</td>
                <td className={`${cell} measure`}>{lengthText(cut.length, display)}</td>
                <td className={`${cell} measure`}>{lengthText(trim.add(cut.start).add(cut.length), display)}</td>
              </tr>
            ))}
            <tr className="text-ink-soft">
              <th scope="row" className={cell}>
                left
              </th>
              <td className={cell}>offcut</td>
              <td className={`${cell} measure`}>{board.offcut.n === 0n ? "none" : lengthText(board.offcut, display)}</td>
              <td className={cell} />
            </tr>
          </DataTable>
        ))}
      </div>
    </div>
  );
}
