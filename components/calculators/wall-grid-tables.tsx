import type { Fraction } from "@/lib/layout/core";
import type { GridCutList, RailPlan, WallGridResult } from "@/lib/layout/wall-grid";
import { CutListBoards } from "./cut-list-boards";
import { BoardsSummaryTable, BuyTable, cutListVerdict, CutListVerdict } from "./cut-list-tables";
import { cell, DataTable, measureCell, rowLine } from "./data-table";
import { lengthText, type Display } from "./readouts";
import { nominalName } from "./wall-grid-fields";

export function faceWidthText(width: Fraction, display: Display): string {
  const nominal = nominalName(width);
  return `${lengthText(width, display)}${nominal ? ` (${nominal})` : ""}`;
}

/** The deductions written out, so the student sees where each cut length comes from. */
export function WallGridWorking({ result, display }: { result: WallGridResult; display: Display }) {
  const t = (v: Fraction) => lengthText(v, display);
  const { top, bottom } = result.rails;
  const layout = result.verticalLayout;
  return (
    <div className="card space-y-1 p-3 text-sm print:hidden" data-working>
      <p>
        <strong>Vertical:</strong>{" "}
        <span className="measure">
          {t(result.wallHeight)} − {t(top.width)} top rail − {t(bottom.width)} bottom rail − {t(bottom.bottom)} base trim = {t(result.verticalLength.exact)}
        </span>
      </p>
      <p>
        <strong>Bay:</strong>{" "}
        <span className="measure">
          ({t(result.wallWidth)} − {layout.count} × {t(layout.memberWidth)}) ÷ {layout.spaces} bays = {t(layout.freeSpace)} ÷ {layout.spaces} = {t(result.bay.exact)}
        </span>{" "}
        — also the cut length of every row rail.
      </p>
      {result.rows.length > 0 ? (
        <p>
          <strong>Panel:</strong>{" "}
          <span className="measure">
            ({t(result.verticalLength.exact)} − {result.rows.length} × {t(result.rows[0].top.sub(result.rows[0].bottom))}) ÷ {result.rows.length + 1} panels = {t(result.panelHeight.exact)}
          </span>
        </p>
      ) : null}
    </div>
  );
}

const KIND_NAME: Record<string, string> = { "top-rail": "Top rail", "bottom-rail": "Bottom rail", vertical: "Vertical", "row-rail": "Row rail" };

export function PieceListTable({ result, display }: { result: WallGridResult; display: Display }) {
  return (
    <DataTable caption="Pieces to cut" columns={["Piece", "Face width", "Cut length", "Qty"]} bodyClassName="measure whitespace-nowrap">
      {result.pieces.map((piece, i) => (
        <tr key={i} className={rowLine}>
          <th scope="row" className={`${cell} font-sans`}>
            {KIND_NAME[piece.kind]}
          </th>
          <td className={cell}>{faceWidthText(piece.memberWidth, display)}</td>
          <td className={cell}>{lengthText(piece.length, display)}</td>
          <td className={cell}>{piece.quantity}</td>
        </tr>
      ))}
    </DataTable>
  );
}

/** Which verticals land on a stud, and how to hold the ones that do not. */
export function StudCheckTable({ result, display }: { result: WallGridResult; display: Display }) {
  const studAt = (index: number) => result.studs.find((s) => s.index === index)!;
  return (
    <div className="space-y-2">
      <DataTable caption="Verticals over the studs" columns={["Vertical", "Centre", "Behind it"]}>
        {result.verticals.map((v) => (
          <tr key={v.index} data-stud-check={v.landsOnStud ? "on" : "misses"} className={`${rowLine} ${v.landsOnStud ? "" : "bg-danger-bg"}`}>
            <th scope="row" className={`${cell} measure`}>
              {v.index}
            </th>
            <td className={measureCell}>{lengthText(v.centerMark.exact, display)}</td>
            <td className={cell}>
              {v.landsOnStud ? (
                <>
                  {v.studs.map((s, i) => (
                    <span key={s} className="inline-block whitespace-nowrap">
                      {i > 0 ? ", " : ""}stud {s} <span className="measure">(centre {lengthText(studAt(s).centerMark.exact, display)})</span>
                    </span>
                  ))}
                </>
              ) : (
                <strong className="whitespace-nowrap text-danger">▲ misses every stud</strong>
              )}
            </td>
          </tr>
        ))}
      </DataTable>
      <p className="text-xs text-ink-soft">
        Stud centres from the left end: <span className="measure">{result.studs.map((s) => lengthText(s.centerMark.exact, display)).join(", ")}</span>. A vertical counts
        as on a stud when at least 1/2″ of it lies over the stud&apos;s 1 1/2″ face.
      </p>
      {result.verticals.some((v) => !v.landsOnStud) ? (
        <aside className="rounded border-l-4 border-danger bg-danger-bg p-3 text-sm print:hidden">
          <strong>Fastening a vertical that misses every stud.</strong> Drywall alone does not hold a nail. Run a bead of construction adhesive down the back,
          then drive pins (brads) in pairs at opposite angles, so they lock the board while the glue sets. Near its top end, a nail angled up into the top
          plate adds hold where the plate is in reach. Check with a stud finder before you trust a drawing of studs you cannot see.
        </aside>
      ) : null}
    </div>
  );
}

export function RowHeightsTable({ result, display }: { result: WallGridResult; display: Display }) {
  return (
    <DataTable caption="Row rails, measured up from the floor" columns={["Row", "Bottom edge", "Centre", "Top edge"]} bodyClassName="measure whitespace-nowrap">
      {result.rows.map((row) => (
        <tr key={row.index} className={rowLine}>
          <th scope="row" className={cell}>
            {row.index}
          </th>
          <td className={cell}>{lengthText(row.bottomMark.exact, display)}</td>
          <td className={cell}>{lengthText(row.centerMark.exact, display)}</td>
          <td className={cell}>{lengthText(row.topMark.exact, display)}</td>
        </tr>
      ))}
    </DataTable>
  );
}

function railLine(rail: RailPlan, display: Display, hasStuds: boolean): string {
  const pieces = rail.pieces.map((p) => lengthText(p, display)).join(" + ");
  if (rail.joints.length === 0) return `one piece, ${pieces}`;
  const joints = rail.joints.map((j) => lengthText(j.exact, display)).join(", ");
  const where = !hasStuds ? "put each joint over a stud" : rail.jointsOnStuds ? "each joint on a stud centre" : "no stud at the joints: glue and pin, or add blocking";
  return `${rail.pieces.length} pieces, ${pieces}; joint${rail.joints.length > 1 ? "s" : ""} at ${joints} from the left (${where})`;
}

export function RailsTable({ result, display }: { result: WallGridResult; display: Display }) {
  const rails = [result.rails.top, result.rails.bottom].filter((rail) => rail.width.n > 0n);
  if (rails.length === 0) return null;
  // On paper the rails only need a line of their own when they are cut in pieces.
  const split = rails.some((rail) => rail.pieces.length > 1);
  return (
    <DataTable caption="Rails across the full width" columns={["Rail", "From the floor", "Cut"]} className={split ? "" : "print:hidden"}>
      {rails.map((rail) => (
        <tr key={rail.label} className={`${rowLine} align-top`} data-rail={rail.label}>
          <th scope="row" className={`${cell} whitespace-nowrap`}>
            {rail.label === "top rail" ? "Top rail" : "Bottom rail"}
          </th>
          <td className={measureCell}>
            {lengthText(rail.bottom, display)} to {lengthText(rail.top, display)}
          </td>
          <td className={`${cell} min-w-48`}>{railLine(rail, display, result.studs.length > 0)}</td>
        </tr>
      ))}
    </DataTable>
  );
}

function buyLine(list: GridCutList, display: Display): string {
  const buy = list.result.byStock.map((s) => `${s.count} × ${lengthText(s.stockLength, display, "feet-inches")}`).join(", ");
  return `buy ${buy} · ${cutListVerdict(list.result).words} · waste ${list.result.wastePercent.toFixed(1)}%`;
}

/** One cut list per face width, each with a link that opens it in the cut-list calculator. */
type CutListsProps = { result: WallGridResult; display: Display; trim: Fraction; cutListHref: (list: GridCutList) => string; idPrefix: string };

export function GridCutLists({ result, display, trim, cutListHref, idPrefix }: CutListsProps) {
  return (
    <section className="space-y-4 print:space-y-2" aria-labelledby={`${idPrefix}-cut-lists`}>
      <h2 id={`${idPrefix}-cut-lists`} className="text-lg print:text-base">
        Cut list · {result.boardCount} board{result.boardCount === 1 ? "" : "s"} in all
      </h2>
      <div className="space-y-4 print:grid print:grid-cols-2 print:gap-3 print:space-y-0 print:text-xs print:[&_table]:text-xs print:[&_caption]:text-xs print:[&_td]:px-1.5 print:[&_td]:py-0.5 print:[&_th]:px-1.5 print:[&_th]:py-0.5">
        {result.cutLists.map((list, i) => {
          const width = faceWidthText(list.memberWidth, display);
          return (
            <div key={i} className="space-y-2 print:break-inside-avoid" data-cut-list-width={lengthText(list.memberWidth, display)}>
              <h3 className="text-base print:text-sm">
                {width} stock <span className="hidden font-normal print:inline">— {buyLine(list, display)}</span>
              </h3>
              <div className="space-y-2 print:hidden">
                <BuyTable result={list.result} display={display} caption={`${width} boards to buy`} />
                <CutListVerdict result={list.result} />
              </div>
              <BoardsSummaryTable result={list.result} display={display} caption={`Cuts from each ${width} board`} />
              <div className="print:hidden">
                <CutListBoards result={list.result} display={display} trim={trim} idPrefix={`${idPrefix}-boards-${i}`} />
              </div>
              <p data-chrome className="text-sm">
                <a href={cutListHref(list)}>Open these {width} pieces in the cut list</a> to change the stock or add prices.
              </p>
            </div>
          );
        })}
      </div>
    </section>
  );
}
