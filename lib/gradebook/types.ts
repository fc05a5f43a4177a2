// The gradebook's plain data, shared by lib/, the route handlers and the client table.
import type { StudentReview } from "@/lib/assignments/student-review";
import type { WorkStatus } from "@/lib/assignments/student-status";
import type { UploadView } from "@/lib/uploads/limits";

export type CellStatus = WorkStatus | "excused";

export type GradebookCell = {
  assignmentId: number;
  /** The score in force: the instructor's override when there is one, else the computed one. */
  earned: number;
  /** What the attempts give, whatever the override says. */
  computedEarned: number;
  possible: number;
  percent: number;
  status: CellStatus;
  late: boolean;
  missing: boolean;
  excused: boolean;
  overridden: boolean;
  photos: number;
};

export type GradebookAssignment = { id: number; title: string; dueAt: string; possible: number; average: number | null; graded: number };

export type GradebookStudent = { id: number; name: string; email: string; cells: GradebookCell[]; earned: number; possible: number; percent: number };

export type Gradebook = { classId: number; className: string; assignments: GradebookAssignment[]; students: GradebookStudent[] };

/** An override as the history lists it; points are in points (not hundredths). */
export type OverrideEntry = {
  id: number;
  action: "points" | "excused" | "cleared";
  points: number | null;
  fromPoints: number | null;
  toPoints: number | null;
  reason: string;
  byName: string;
  at: string;
};

/** What a student is told about an override in force. */
export type OverrideNotice = { earned: number | null; excused: boolean; reason: string; at: string };

/** The drill-down as the browser receives it (lib/gradebook/drill-down.ts builds it). */
export type DrillDownView = {
  review: StudentReview;
  /** Seconds each try took, by `${problemId}:${tryNumber}`, where the browser measured it. */
  secondsPerTry: Record<string, number>;
  photos: UploadView[];
  history: OverrideEntry[];
  inForce: OverrideNotice | null;
};
