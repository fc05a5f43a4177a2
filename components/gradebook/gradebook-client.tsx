"use client";

import dynamic from "next/dynamic";
import { useMemo, useState } from "react";
import useSWR from "swr";
import { Alert } from "@/components/ui/alert";
import { callApi } from "@/components/ui/call-api";
import type { Gradebook } from "@/lib/gradebook/types";
import { FlagLegend } from "./cell-badges";
import { GradeTable } from "./grade-table";
import { StudentCards } from "./student-cards";

// The drill-down (its review, photos and the override form with its validation) opens only on a
// click or Enter, so it is not part of the gradebook's first load: it is fetched as soon as the
// pointer or the focus comes into the gradebook, a moment before it is asked for.
const loadDrillDown = () => import("./drill-down-panel").then((m) => m.DrillDownPanel);
const prefetchDrillDown = () => void loadDrillDown().catch(() => undefined);
const DrillDownPanel = dynamic(loadDrillDown, { ssr: false });

async function fetchGradebook(url: string): Promise<Gradebook> {
  const result = await callApi<{ gradebook: Gradebook }>(url, "GET");
  if (!result.ok) throw new Error(result.message);
  return result.data.gradebook;
}

type Filters = { search: string; late: boolean; missing: boolean; below: string };

/** The instructor's gradebook: painted at once from the server's data, refreshed by SWR after each change. */
export function GradebookClient({ initial }: { initial: Gradebook }) {
  const url = `/api/classes/${initial.classId}/gradebook`;
  const { data = initial, error, mutate, isValidating } = useSWR(url, fetchGradebook, { fallbackData: initial, revalidateOnMount: false });
  const [filters, setFilters] = useState<Filters>({ search: "", late: false, missing: false, below: "" });
  const [open, setOpen] = useState<{ assignmentId: number; studentId: number } | null>(null);
  const below = filters.below.trim() === "" ? null : Number(filters.below);
  const belowInvalid = below !== null && (!Number.isFinite(below) || below < 0 || below > 100);

  const students = useMemo(() => {
    const q = filters.search.trim().toLocaleLowerCase();
    return data.students.filter(
      (s) =>
        (!q || s.name.toLocaleLowerCase().includes(q)) &&
        (!filters.late || s.cells.some((c) => c.late)) &&
        (!filters.missing || s.cells.some((c) => c.missing)) &&
        (below === null || belowInvalid || s.percent < below),
    );
  }, [data.students, filters, below, belowInvalid]);

  const set = (changes: Partial<Filters>) => setFilters((f) => ({ ...f, ...changes }));
  const openCell = open ? data.students.find((s) => s.id === open.studentId)?.cells.find((c) => c.assignmentId === open.assignmentId) ?? null : null;

  if (data.assignments.length === 0 || data.students.length === 0) {
    return (
      <div className="card space-y-2 p-6" data-gradebook-empty>
        <h2 className="text-lg">{data.students.length === 0 ? "No students on the roster yet" : "No published assignments yet"}</h2>
        <p className="text-ink-soft">
          {data.students.length === 0
            ? "Scores show here once students join the class. Add them from the roster."
            : "Scores show here once an assignment is published. Build one and publish it, and each student's score appears as they work."}
        </p>
        <a className="btn-primary inline-block" href={data.students.length === 0 ? `/classes/${data.classId}/add-students` : `/classes/${data.classId}/assignments`}>
          {data.students.length === 0 ? "Add students" : "Go to assignments"}
        </a>
      </div>
    );
  }

  return (
    <div className="space-y-4" onPointerOver={prefetchDrillDown} onFocus={prefetchDrillDown}>
      <div className="flex flex-wrap items-end justify-between gap-3" data-chrome>
        <form role="search" className="flex flex-wrap items-end gap-3" onSubmit={(e) => e.preventDefault()} aria-label="Filter the gradebook">
          <div>
            <label htmlFor="gb-search" className="mb-1 block text-sm font-semibold">
              Find a student
            </label>
            <input id="gb-search" type="search" className="input w-48" value={filters.search} onChange={(e) => set({ search: e.target.value })} placeholder="Name" />
          </div>
          <label className="flex items-center gap-2 pb-2 text-sm">
            <input type="checkbox" checked={filters.late} onChange={(e) => set({ late: e.target.checked })} /> Has late work
          </label>
          <label className="flex items-center gap-2 pb-2 text-sm">
            <input type="checkbox" checked={filters.missing} onChange={(e) => set({ missing: e.target.checked })} /> Has missing work
          </label>
          <div>
            <label htmlFor="gb-below" className="mb-1 block text-sm font-semibold">
              Total below (%)
            </label>
            <input
              id="gb-below"
              inputMode="decimal"
              className="input w-24"
              value={filters.below}
              onChange={(e) => set({ below: e.target.value })}
              aria-invalid={belowInvalid || undefined}
              aria-describedby={belowInvalid ? "gb-below-error" : undefined}
            />
            {belowInvalid ? (
              <p id="gb-below-error" className="mt-1 text-sm font-semibold text-danger">
                Enter a percent from 0 to 100.
              </p>
            ) : null}
          </div>
        </form>
        <div className="flex flex-wrap gap-2">
          <a className="btn-primary" href={`/api/classes/${data.classId}/gradebook.csv`} download data-export>
            Export CSV
          </a>
          <button type="button" className="btn-quiet" onClick={() => window.print()}>
            Print
          </button>
        </div>
      </div>
      {error ? <Alert tone="error">Could not refresh the gradebook: {error.message} The scores shown may be out of date.</Alert> : null}
      <p className="text-sm text-ink-soft" aria-live="polite" data-chrome>
        Showing {students.length} of {data.students.length} students{isValidating ? " · refreshing…" : ""}. Arrow keys move between scores; Enter opens a student&apos;s work.
      </p>
      {students.length === 0 ? (
        <p className="card p-4 text-ink-soft">No student matches these filters.</p>
      ) : (
        <>
          <div className="hidden sm:block print:block">
            <GradeTable classId={data.classId} assignments={data.assignments} students={students} onOpen={(assignmentId, studentId) => setOpen({ assignmentId, studentId })} />
          </div>
          <div className="sm:hidden print:hidden">
            <StudentCards classId={data.classId} assignments={data.assignments} students={students} onOpen={(assignmentId, studentId) => setOpen({ assignmentId, studentId })} />
          </div>
        </>
      )}
      <FlagLegend />
      {open ? (
        <DrillDownPanel
          key={`${open.assignmentId}:${open.studentId}`}
          classId={data.classId}
          assignmentId={open.assignmentId}
          studentId={open.studentId}
          cell={openCell}
          onClose={() => setOpen(null)}
          onChanged={() => void mutate()}
        />
      ) : null}
    </div>
  );
}
