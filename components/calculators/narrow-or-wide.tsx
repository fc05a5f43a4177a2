import type { ReactNode } from "react";

/**
 * A drawing drawn twice, on a wide canvas and on the narrower one a phone gets so that its labels
 * come out large enough to read in the shop, with CSS showing the one that fits. Choosing in
 * script would redraw every shape just after a phone's first paint, in one long task. With
 * `onPaper` the printed shop sheet, which shares its page with the tables, gets the narrow one too.
 */
export function NarrowOrWide({ wide, narrow, onPaper = false }: { wide: ReactNode; narrow: ReactNode; onPaper?: boolean }) {
  return (
    <>
      <div className={onPaper ? "max-sm:hidden print:hidden" : "max-sm:hidden"}>{wide}</div>
      <div className={onPaper ? "hidden max-sm:block print:block" : "hidden max-sm:block"}>{narrow}</div>
    </>
  );
}
