import type { Metadata } from "next";
import Link from "next/link";
import { FractionBench } from "@/components/calculators/fraction-bench";
import { getCurrentUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Fraction bench" };

export default async function FractionBenchPage({ searchParams }: PageProps<"/calculators/fraction-bench">) {
  const [params, user] = await Promise.all([searchParams, getCurrentUser()]);
  return (
    <div className="space-y-4">
      <nav aria-label="Breadcrumb" data-chrome className="text-sm">
        <Link href="/calculators">Calculators</Link> <span aria-hidden="true">/</span> Fraction bench
      </nav>
      <header className="max-w-prose space-y-1">
        <h1 className="text-2xl">Fraction bench</h1>
        <p className="text-ink-soft">
          The arithmetic behind every layout, done exactly: work a calculation on lengths, turn a calculator&apos;s decimal into the nearest
          sixteenth, see which graduation a length rounds to, and practise reading a tape.
        </p>
      </header>
      <FractionBench initial={params} signedIn={user !== null} />
    </div>
  );
}
