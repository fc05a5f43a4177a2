"use client";

import { flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type ColumnDef, type SortingState } from "@tanstack/react-table";
import { useMemo, useRef, useState, type KeyboardEvent } from "react";
import type { GradebookAssignment, GradebookStudent } from "@/lib/gradebook/types";
import { CellFlags, cellText } from "./cell-badges";

type Props = {
  classId: number;
  assignments: GradebookAssignment[];
  students: GradebookStudent[];
  onOpen: (assignmentId: number, studentId: number) => void;
};

// Excused work sorts below every score, whichever way the column is sorted by points.
const sortValue = (s: GradebookStudent, index: number) => (s.cells[index].excused ? -1 : s.cells[index].earned);
// "Mar 4", as Intl writes it in en-US, spelled out here: the page's first Intl date formatter loads
// time-zone data, 30 ms of a phone's first load of the gradebook.
const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];
const shortDate = (iso: string) => {
  const date = new Date(iso);
  return `${MONTHS[date.getUTCMonth()]} ${date.getUTCDate()}`;
};

/**
 * The students × assignments grid. Arrow keys move between cells (one tab stop for the whole
 * grid), Home/End go to the row's ends, Enter on a score opens that student's work.
 */
export function GradeTable({ classId, assignments, students, onOpen }: Props) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const [active, setActive] = useState<{ row: number; col: number }>({ row: 0, col: 1 });
  const gridRef = useRef<HTMLTableElement>(null);

  const columns = useMemo<ColumnDef<GradebookStudent>[]>(
    () => [
      { id: "name", header: "Student", accessorFn: (s) => s.name.toLocaleLowerCase(), sortingFn: "text" },
      ...assignments.map<ColumnDef<GradebookStudent>>((a, index) => ({ id: `a${a.id}`, header: a.title, accessorFn: (s) => sortValue(s, index) })),
      { id: "total", header: "Total", accessorFn: (s) => s.earned },
      { id: "percent", header: "Percent", accessorFn: (s) => s.percent },
    ],
    [assignments],
  );
  // The table instance is rebuilt each render by design; the compiler leaves this component alone.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({ data: students, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });
  const rows = table.getRowModel().rows;
  const lastCol = assignments.length + 2;
  const row = Math.min(active.row, Math.max(rows.length - 1, 0));

  const focusCell = (r: number, c: number) => {
    const next = { row: Math.max(0, Math.min(rows.length - 1, r)), col: Math.max(0, Math.min(lastCol, c)) };
    setActive(next);
    gridRef.current?.querySelector<HTMLElement>(`[data-cell="${next.row}:${next.col}"]`)?.focus();
  };

  const onKeyDown = (event: KeyboardEvent<HTMLTableElement>) => {
    const target = (event.target as HTMLElement).closest<HTMLElement>("[data-cell]");
    if (!target) return;
    const [r, c] = target.dataset.cell!.split(":").map(Number);
    const moves: Record<string, [number, number]> = { ArrowUp: [r - 1, c], ArrowDown: [r + 1, c], ArrowLeft: [r, c - 1], ArrowRight: [r, c + 1], Home: [r, 0], End: [r, lastCol] };
    if (event.key in moves) {
      event.preventDefault();
      focusCell(...moves[event.key]);
    } else if ((event.key === "Enter" || event.key === " ") && c >= 1 && c <= assignments.length) {
      event.preventDefault();
      onOpen(assignments[c - 1].id, rows[r].original.id);
    }
  };

  const tabIndex = (r: number, c: number) => (r === row && c === active.col ? 0 : -1);
  const sortLabel = (dir: false | "asc" | "desc") => (dir === "asc" ? "sorted low to high" : dir === "desc" ? "sorted high to low" : "not sorted");

  return (
    <div className="card max-h-[70vh] overflow-auto print:max-h-none print:overflow-visible" data-gradebook-table>
      <table ref={gridRef} role="grid" aria-label="Gradebook: students down the side, assignments across" aria-rowcount={rows.length + 1} className="min-w-full border-separate border-spacing-0 text-left text-sm print:text-xs" onKeyDown={onKeyDown}>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header, index) => {
                const dir = header.column.getIsSorted();
                const assignment = index >= 1 && index <= assignments.length ? assignments[index - 1] : null;
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={dir === "asc" ? "ascending" : dir === "desc" ? "descending" : "none"}
                    className={`sticky top-0 z-10 border-b-2 border-rule-strong bg-paper-raised px-2 py-2 align-bottom ${index === 0 ? "left-0 z-20 min-w-44" : "min-w-24 text-right"}`}
                  >
                    <button
                      type="button"
                      className="inline-flex items-end gap-1 text-left font-semibold"
                      onClick={header.column.getToggleSortingHandler()}
                      aria-label={`${String(header.column.columnDef.header)}, ${sortLabel(dir)}. Sort`}
                      data-sort={header.id}
                    >
                      <span className={index === 0 ? "" : "line-clamp-3 max-w-32"}>{flexRender(header.column.columnDef.header, header.getContext())}</span>
                      <span aria-hidden="true" className="text-ink-faint">
                        {dir === "asc" ? "▲" : dir === "desc" ? "▼" : "↕"}
                      </span>
                    </button>
                    {assignment ? (
                      <span className="block text-xs font-normal text-ink-faint">
                        due {shortDate(assignment.dueAt)} · {assignment.possible} pts
                        <span className="block whitespace-nowrap">class avg {assignment.average === null ? "—" : `${assignment.average}%`}</span>
                      </span>
                    ) : null}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {rows.map((r, ri) => {
            const s = r.original;
            return (
              <tr key={s.id} data-student={s.name} className="group">
                <th scope="row" className="sticky left-0 z-[5] border-b border-rule bg-paper-raised px-2 py-1.5 font-semibold group-hover:bg-paper-sunk">
                  <span data-cell={`${ri}:0`} tabIndex={tabIndex(ri, 0)} onFocus={() => setActive({ row: ri, col: 0 })} className="block rounded-sm outline-offset-2 focus-visible:outline-3 focus-visible:outline-chalk">
                    {s.name}
                  </span>
                  <a href={`/api/classes/${classId}/students/${s.id}/record.csv`} download className="text-xs font-normal" tabIndex={-1} data-chrome aria-label={`Download ${s.name}'s record (CSV)`}>
                    record
                  </a>
                </th>
                {s.cells.map((cell, ci) => {
                  const a = assignments[ci];
                  return (
                    <td key={a.id} className="gb-td" data-status={cell.status}>
                      <button
                        type="button"
                        data-cell={`${ri}:${ci + 1}`}
                        tabIndex={tabIndex(ri, ci + 1)}
                        onFocus={() => setActive({ row: ri, col: ci + 1 })}
                        onClick={() => onOpen(a.id, s.id)}
                        aria-label={`${s.name}, ${a.title}: ${cell.excused ? "excused" : `${cell.earned} of ${cell.possible} points`}, ${cell.status.replace("-", " ")}. Open the work`}
                        className="gb-cell"
                      >
                        <CellFlags cell={cell} />
                        <span className="measure">{cellText(cell)}</span>
                      </button>
                    </td>
                  );
                })}
                <td className="measure border-b border-rule px-2 py-1.5 text-right whitespace-nowrap group-hover:bg-paper-sunk">
                  <span data-cell={`${ri}:${lastCol - 1}`} tabIndex={tabIndex(ri, lastCol - 1)} onFocus={() => setActive({ row: ri, col: lastCol - 1 })} className="outline-offset-2 focus-visible:outline-3 focus-visible:outline-chalk">
                    {s.earned} / {s.possible}
                  </span>
                </td>
                <td className="measure border-b border-rule px-2 py-1.5 text-right font-semibold group-hover:bg-paper-sunk" data-percent>
                  <span data-cell={`${ri}:${lastCol}`} tabIndex={tabIndex(ri, lastCol)} onFocus={() => setActive({ row: ri, col: lastCol })} className="outline-offset-2 focus-visible:outline-3 focus-visible:outline-chalk">
                    {s.percent}%
                  </span>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
