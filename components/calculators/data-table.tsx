import { useId, type ReactNode } from "react";
import { ScrollRegion } from "@/components/ui/scroll-region";

/** Cell padding for body cells; add `measure` (and `whitespace-nowrap`) where a cell holds a length. */
export const cell = "px-3 py-1.5";
/** A length or count cell: tape figures in the mono face, never broken across lines. */
export const measureCell = `${cell} measure whitespace-nowrap`;
/** A body row ruled off from the next. */
export const rowLine = "border-b border-rule last:border-0";

/** Long tables show this many rows on screen until asked for all. */
export const FIRST_ROWS = 40;

type Props = {
  caption: ReactNode;
  /** The header row, one entry a column. */
  columns: ReactNode[];
  /** The body rows. */
  children: ReactNode;
  bodyClassName?: string;
  foot?: ReactNode;
  /** Small print below the table, inside the same card. */
  note?: ReactNode;
  /** Extra classes on the card (print rules, for instance). */
  className?: string;
  /** Smaller type and tighter header on the printed shop sheet. */
  compactPrint?: boolean;
  /** data-* attributes for the card, which the tests and the print sheet find it by. */
  data?: Record<`data-${string}`, string | number>;
};

/**
 * The calculators' results table: a captioned card that scrolls sideways on a phone instead of
 * squeezing the columns, with one header row.
 */
export function DataTable({ caption, columns, children, bodyClassName, foot, note, className, compactPrint, data }: Props) {
  const head = `px-3 py-2${compactPrint ? " print:py-1" : ""}`;
  const captionId = useId();
  return (
    <ScrollRegion labelledBy={captionId} className={`card${className ? ` ${className}` : ""}`} data={data}>
      <table className={`w-full text-left text-sm${compactPrint ? " print:text-xs" : ""}`}>
        <caption id={captionId} className="px-3 pt-2 text-left text-sm font-semibold">
          {caption}
        </caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            {columns.map((column, i) => (
              <th key={i} scope="col" className={head}>
                {column}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className={bodyClassName}>{children}</tbody>
        {foot}
      </table>
      {note}
    </ScrollRegion>
  );
}

/** The button under a long table that shows every row or folds back to the first few. */
export function ShowAllRows({ count, all, onToggle }: { count: number; all: boolean; onToggle: () => void }) {
  if (count <= FIRST_ROWS) return null;
  return (
    <button type="button" data-chrome className="btn-quiet" onClick={onToggle}>
      {all ? `Show the first ${FIRST_ROWS}` : `Show all ${count} rows`}
    </button>
  );
}
