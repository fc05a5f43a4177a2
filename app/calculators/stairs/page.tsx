import type { Metadata } from "next";
import Link from "next/link";
import { StairCalculator } from "@/components/calculators/stair-calculator";
import { getCurrentUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Stair layout" };

export default async function StairLayoutPage({ searchParams }: PageProps<"/calculators/stairs">) {
  const [params, user] = await Promise.all([searchParams, getCurrentUser()]);
  return (
    <div className="space-y-4">
      <nav aria-label="Breadcrumb" data-chrome className="text-sm">
        <Link href="/calculators">Calculators</Link> <span aria-hidden="true">/</span> Stair layout
      </nav>
      <header className="max-w-prose space-y-1">
        <h1 className="text-2xl">Stair layout</h1>
        <p className="text-ink-soft print:hidden">
          Divide the <strong>total rise</strong> — finished floor to finished floor — into equal risers no taller than the limit. There is one
          tread fewer than risers, because the upper floor is the last step; the treads times their depth is the total run.
        </p>
      </header>
      <StairCalculator initial={params} signedIn={user !== null} />
    </div>
  );
}
