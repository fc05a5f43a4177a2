import Link from "next/link";
import type { ComponentType, ReactNode } from "react";
import type { SearchParamsRecord } from "@/components/calculators/use-url-form";
import { getCurrentUser } from "@/lib/auth/session";

type Props = {
  title: string;
  /** The page's own paragraph: the idea behind the calculator, in the trade's words. */
  intro: ReactNode;
  /** Keep the intro on the printed shop sheet (most calculators leave it off to save paper). */
  printIntro?: boolean;
  calculator: ComponentType<{ initial?: SearchParamsRecord; signedIn?: boolean }>;
  searchParams: Promise<SearchParamsRecord>;
};

/**
 * What every calculator page is: a breadcrumb, the heading and intro, and the calculator
 * started from the address bar. It lives in app/ rather than components/ because it reads
 * the session, which only the app layer may do.
 */
export async function CalculatorPage({ title, intro, printIntro = false, calculator: Calculator, searchParams }: Props) {
  const [params, user] = await Promise.all([searchParams, getCurrentUser()]);
  return (
    <div className="space-y-4">
      <nav aria-label="Breadcrumb" data-chrome className="text-sm">
        <Link href="/calculators">Calculators</Link> <span aria-hidden="true">/</span> {title}
      </nav>
      <header className="max-w-prose space-y-1">
        <h1 className="text-2xl">{title}</h1>
        <p className={printIntro ? "text-ink-soft" : "text-ink-soft print:hidden"}>{intro}</p>
      </header>
      <Calculator initial={params} signedIn={user !== null} />
    </div>
  );
}
