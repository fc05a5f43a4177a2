"use client";

import { useState } from "react";
import type { MemberMarks } from "@/lib/layout/spacing";
import { lengthText, type Display } from "./readouts";

const FIRST_ROWS = 40;

/** Every member's marks, measured from the left end; long layouts show the first rows until asked. */
export function MarksTable({ members, display, memberName = "Member" }: { members: MemberMarks[]; display: Display; memberName?: string }) {
  const [all, setAll] = useState(false);
  const shown = all ? members : members.slice(0, FIRST_ROWS);
  return (
    <div className="space-y-2">
      <div className="card overflow-x-auto">
        <table className="w-full text-left text-sm">
          <caption className="px-3 pt-2 text-left text-sm font-semibold">Marks from the left end</caption>
          <thead className="border-b border-rule bg-paper-sunk">
            <tr>
              <th scope="col" className="px-3 py-2">
                {memberName}
              </th>
              <th scope="col" className="px-3 py-2">
                Left edge
              </th>
              <th scope="col" className="px-3 py-2">
                Centre
              </th>
              <th scope="col" className="px-3 py-2">
                Right edge
              </th>
            </tr>
          </thead>
          <tbody className="measure whitespace-nowrap">
            {shown.map((m) => (
              <tr key={m.index} className="border-b border-rule last:border-0">
                <th scope="row" className="px-3 py-1.5">
                  {m.index}
                </th>
                <td className="px-3 py-1.5">{lengthText(m.startMark.exact, display)}</td>
                <td className="px-3 py-1.5">{lengthText(m.centerMark.exact, display)}</td>
                <td className="px-3 py-1.5">{lengthText(m.endMark.exact, display)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {members.length > FIRST_ROWS ? (
        <button type="button" data-chrome className="btn-quiet" onClick={() => setAll(!all)}>
          {all ? `Show the first ${FIRST_ROWS}` : `Show all ${members.length} rows`}
        </button>
      ) : null}
    </div>
  );
}
