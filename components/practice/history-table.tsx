import Link from "next/link";
import type { HistoryPage } from "@/lib/practice/history";
import { ScrollRegion } from "@/components/ui/scroll-region";

const STATUS = { open: "In progress", solved: "Solved", failed: "Out of tries" } as const;
const when = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

export function PracticeHistoryTable({ history }: { history: HistoryPage }) {
  return (
    <section aria-labelledby="history" className="space-y-3">
      <h2 id="history" className="text-xl">
        Your recent problems
      </h2>
      {history.total === 0 ? (
        <p className="text-ink-soft">Nothing yet. Start a problem above; each one you finish counts toward mastering its skill.</p>
      ) : (
        <>
          <ScrollRegion labelledBy="practice-history-caption" className="rounded-lg border border-rule">
            <table className="w-full text-left text-sm">
              <caption id="practice-history-caption" className="sr-only">Your practice problems, newest first</caption>
              <thead className="bg-paper-sunk">
                <tr>
                  <th scope="col" className="px-3 py-2">Problem</th>
                  <th scope="col" className="px-3 py-2">Level</th>
                  <th scope="col" className="px-3 py-2">Result</th>
                  <th scope="col" className="px-3 py-2">Tries</th>
                  <th scope="col" className="px-3 py-2">Started (UTC)</th>
                </tr>
              </thead>
              <tbody>
                {history.problems.map((p) => (
                  <tr key={p.id} className="border-t border-rule">
                    <td className="px-3 py-2">
                      <Link href={`/practice/${p.id}`}>{p.title}</Link>
                    </td>
                    <td className="px-3 py-2">{p.level}</td>
                    <td className="px-3 py-2">{STATUS[p.status]}</td>
                    <td className="px-3 py-2 measure">{p.attemptsUsed}</td>
                    <td className="px-3 py-2">{when.format(new Date(p.createdAt))}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </ScrollRegion>
          {history.pages > 1 ? (
            <nav aria-label="History pages" className="flex items-center gap-3 text-sm">
              {history.page > 1 ? <Link href={`/practice?page=${history.page - 1}#history`}>Newer</Link> : null}
              <span>
                Page {history.page} of {history.pages}
              </span>
              {history.page < history.pages ? <Link href={`/practice?page=${history.page + 1}#history`}>Older</Link> : null}
            </nav>
          ) : null}
        </>
      )}
    </section>
  );
}
