import type { Metadata } from "next";
import Link from "next/link";
import { CALCULATORS } from "@/lib/calculators";

export const metadata: Metadata = { title: "Calculators" };

export default function CalculatorsPage() {
  return (
    <div className="space-y-6">
      <header className="max-w-prose space-y-2">
        <h1 className="text-2xl">Calculators</h1>
        <p className="text-ink-soft">
          Type measurements the way you read them off the tape — <span className="measure">22 3/4</span>,{" "}
          <span className="measure">1&apos; 10 3/4&quot;</span>, <span className="measure">600 mm</span>. Every result shows the exact value, the
          value rounded to your precision, and how far the rounding moved it. The address bar keeps the whole layout, so you can
          bookmark it or send it to your crew.
        </p>
      </header>
      <ul className="grid gap-4 md:grid-cols-2 lg:grid-cols-3">
        {CALCULATORS.map((c) => (
          <li key={c.kind}>
            <Link href={`/calculators/${c.kind}`} className="card block h-full p-5 text-ink no-underline hover:border-chalk">
              <h2 className="text-lg text-chalk-dark underline decoration-1 underline-offset-2">{c.title}</h2>
              <p className="mt-2 text-ink-soft">{c.summary}</p>
            </Link>
          </li>
        ))}
      </ul>
    </div>
  );
}
