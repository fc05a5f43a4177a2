import type { Metadata } from "next";
import Link from "next/link";
import { EvenSpacingCalculator } from "@/components/calculators/even-spacing-calculator";
import { getCurrentUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Even spacing" };

export default async function EvenSpacingPage({ searchParams }: PageProps<"/calculators/even-spacing">) {
  const [params, user] = await Promise.all([searchParams, getCurrentUser()]);
  return (
    <div className="space-y-4">
      <nav aria-label="Breadcrumb" data-chrome className="text-sm">
        <Link href="/calculators">Calculators</Link> <span aria-hidden="true">/</span> Even spacing
      </nav>
      <header className="max-w-prose space-y-1">
        <h1 className="text-2xl">Even spacing</h1>
        <p className="text-ink-soft">
          Take the members off the span and divide what is left by the number of <strong>spaces</strong> — one fewer than the members when a
          member sits at each end, one more when the layout runs between posts.
        </p>
      </header>
      <EvenSpacingCalculator initial={params} signedIn={user !== null} />
    </div>
  );
}
