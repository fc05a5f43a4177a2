import type { Metadata } from "next";
import Link from "next/link";
import { GuardSpacingCalculator } from "@/components/calculators/guard-spacing-calculator";
import { getCurrentUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Guard spacing" };

export default async function GuardSpacingPage({ searchParams }: PageProps<"/calculators/guard-spacing">) {
  const [params, user] = await Promise.all([searchParams, getCurrentUser()]);
  return (
    <div className="space-y-4">
      <nav aria-label="Breadcrumb" data-chrome className="text-sm">
        <Link href="/calculators">Calculators</Link> <span aria-hidden="true">/</span> Guard spacing
      </nav>
      <header className="max-w-prose space-y-1">
        <h1 className="text-2xl">Guard spacing</h1>
        <p className="text-ink-soft print:hidden">
          Balusters between two posts, with an opening at each end: find the fewest balusters that keep <strong>every opening under the
          limit</strong>, then divide the free space by the spaces — one more than the balusters. An opening of exactly 4″ lets a 4″ sphere
          through, so it fails.
        </p>
      </header>
      <GuardSpacingCalculator initial={params} signedIn={user !== null} />
    </div>
  );
}
