import type { KeyMode } from "@/lib/worksheets/worksheets";
import { PrintButton } from "./print-button";

const KEY_LABELS: Record<KeyMode, string> = {
  with: "Worksheets, then the answer key",
  without: "Worksheets only",
  only: "Answer key only",
};

/**
 * What to print, as a plain GET form: the choice lives in the address (so it can be bookmarked for
 * next term) and works before any script loads. Hidden on paper.
 */
export function WorksheetOptions({ keyMode, student, roster, pageCount }: { keyMode: KeyMode; student: number | undefined; roster: { id: number; name: string }[]; pageCount: number }) {
  return (
    <form method="get" className="card flex flex-wrap items-end gap-3 p-4" data-chrome aria-label="What to print">
      <div className="min-w-56 flex-1">
        <label htmlFor="ws-key" className="mb-1 block text-sm font-semibold">
          Print
        </label>
        <select id="ws-key" name="key" defaultValue={keyMode} className="input">
          {(Object.keys(KEY_LABELS) as KeyMode[]).map((mode) => (
            <option key={mode} value={mode}>
              {KEY_LABELS[mode]}
            </option>
          ))}
        </select>
      </div>
      <div className="min-w-56 flex-1">
        <label htmlFor="ws-student" className="mb-1 block text-sm font-semibold">
          Students
        </label>
        <select id="ws-student" name="student" defaultValue={student ?? ""} className="input">
          <option value="">Every active student ({roster.length})</option>
          {roster.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </select>
      </div>
      <button type="submit" className="btn-quiet">
        Show
      </button>
      <PrintButton disabled={pageCount === 0} />
    </form>
  );
}
