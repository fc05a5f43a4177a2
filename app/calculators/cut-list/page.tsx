import type { Metadata } from "next";
import Link from "next/link";
import { CutListCalculator } from "@/components/calculators/cut-list-calculator";
import { getCurrentUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Cut list" };

export default async function CutListPage({ searchParams }: PageProps<"/calculators/cut-list">) {
  const [params, user] = await Promise.all([searchParams, getCurrentUser()]);
  return (
    <div className="space-y-4">
      <nav aria-label="Breadcrumb" data-chrome className="text-sm">
        <Link href="/calculators">Calculators</Link> <span aria-hidden="true">/</span> Cut list
      </nav>
      <header className="max-w-prose space-y-1">
        <h1 className="text-2xl">Cut list</h1>
        <p className="text-ink-soft print:hidden">
          List the pieces and the stock lengths you can buy. Every saw cut turns a <strong>kerf</strong> of wood to dust, so four 24″ pieces do
          not come out of one 96″ board: the plan counts a kerf after every piece but the last, and shows what each board gives and the
          <strong> offcut</strong> left over.
        </p>
      </header>
      <CutListCalculator initial={params} signedIn={user !== null} />
    </div>
  );
}
