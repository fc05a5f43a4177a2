"use client";

import { useState } from "react";
import type { MemberMarks } from "@/lib/layout/spacing";
import { cell, DataTable, FIRST_ROWS, rowLine, ShowAllRows } from "./data-table";
import { lengthText, type Display } from "./readouts";

/** Every member's marks, measured from the left end; long layouts show the first rows until asked. */
export function MarksTable({ members, display, memberName = "Member" }: { members: MemberMarks[]; display: Display; memberName?: string }) {
  const [all, setAll] = useState(false);
  const shown = all ? members : members.slice(0, FIRST_ROWS);
  return (
    <div className="space-y-2">
      <DataTable caption="Marks from the left end" columns={[memberName, "Left edge", "Centre", "Right edge"]} bodyClassName="measure whitespace-nowrap">
        {shown.map((m) => (
          <tr key={m.index} className={rowLine}>
            <th scope="row" className={cell}>
              {m.index}
            </th>
            <td className={cell}>{lengthText(m.startMark.exact, display)}</td>
            <td className={cell}>{lengthText(m.centerMark.exact, display)}</td>
            <td className={cell}>{lengthText(m.endMark.exact, display)}</td>
          </tr>
        ))}
      </DataTable>
      <ShowAllRows count={members.length} all={all} onToggle={() => setAll(!all)} />
    </div>
  );
}
