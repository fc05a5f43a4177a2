import type { Metadata } from "next";
import Link from "next/link";
import { WallGridCalculator } from "@/components/calculators/wall-grid-calculator";
import { getCurrentUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Wall grid" };

export default async function WallGridPage({ searchParams }: PageProps<"/calculators/wall-grid">) {
  const [params, user] = await Promise.all([searchParams, getCurrentUser()]);
  return (
    <div className="space-y-4">
      <nav aria-label="Breadcrumb" data-chrome className="text-sm">
        <Link href="/calculators">Calculators</Link> <span aria-hidden="true">/</span> Wall grid
      </nav>
      <header className="max-w-prose space-y-1">
        <h1 className="text-2xl">Wall grid</h1>
        <p className="text-ink-soft print:hidden">
          A board-and-batten or grid wall. The rails run the full width; the <strong>verticals</strong> are cut to the height left between them
          and spaced so every <strong>bay</strong> is equal, and each row rail is cut to the bay. Every mark is measured from the left end of the
          wall and from the floor.
        </p>
      </header>
      <WallGridCalculator initial={params} signedIn={user !== null} />
    </div>
  );
}
