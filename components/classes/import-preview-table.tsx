import type { ImportRow } from "@/lib/classes/import";

function Result({ row }: { row: ImportRow }) {
  return (
    <>
      <span className={`inline-block rounded-sm px-2 py-0.5 text-xs font-semibold whitespace-nowrap ${STATUS[row.status].style}`}>{STATUS[row.status].word}</span>
      {row.message ? <span className="mt-1 block font-normal text-ink-soft">{row.message}</span> : null}
      {row.note ? <span className="mt-1 block font-normal text-ink-soft">{row.note}</span> : null}
    </>
  );
}

const STATUS = {
  invite: { word: "Will invite", style: "bg-ok-bg text-ok" },
  resend: { word: "Will re-send", style: "bg-chalk-light text-chalk-dark" },
  error: { word: "Error", style: "bg-danger-bg text-danger" },
} as const;

/** Every row of the file with what will happen to it; errors say what to fix. */
export function ImportPreviewTable({ rows }: { rows: ImportRow[] }) {
  return (
    <div className="card max-h-[28rem] overflow-auto">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">What each row of the roster file will do</caption>
        <thead className="sticky top-0 border-b border-rule bg-paper-sunk">
          <tr>
            <th scope="col" className="px-3 py-2">
              Line
            </th>
            <th scope="col" className="px-3 py-2">
              Name and e-mail
            </th>
            <th scope="col" className="hidden px-3 py-2 sm:table-cell">
              Result
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.line} className={`border-b border-rule last:border-0 ${row.status === "error" ? "bg-danger-bg/40" : ""}`}>
              <td className="measure px-3 py-2 align-top">{row.line}</td>
              <td className="px-3 py-2 align-top">
                <span className="block font-semibold">{row.name || "—"}</span>
                <span className="block break-all text-ink-soft">{row.email || "—"}</span>
                {/* On a phone the result sits under the address, so the address keeps the width. */}
                <span className="mt-1 block sm:hidden">
                  <Result row={row} />
                </span>
              </td>
              <td className="hidden px-3 py-2 align-top sm:table-cell">
                <Result row={row} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
