import Link from "next/link";
import { HeaderAccount, HeaderNav } from "./header-account";
import { TapeRule } from "./tape-rule";

export function SiteHeader() {
  return (
    <header data-chrome className="border-b border-rule bg-paper-raised">
      <div className="mx-auto flex max-w-page flex-wrap items-center gap-x-4 gap-y-1 px-4 py-2">
        <Link href="/" className="flex min-h-touch shrink-0 items-center gap-2 text-ink no-underline">
          <Logo />
          <span className="text-xl font-bold tracking-tight">Sixteenths</span>
        </Link>
        <nav aria-label="Main" className="order-last -mx-2 w-full sm:order-none sm:mx-0 sm:w-auto sm:min-w-0 sm:flex-1">
          <HeaderNav />
        </nav>
        <div className="ml-auto flex shrink-0 items-center gap-2">
          <HeaderAccount />
        </div>
      </div>
      <TapeRule />
    </header>
  );
}

function Logo() {
  // A square and a one-sixteenth tick: layout and precision.
  return (
    <svg aria-hidden="true" viewBox="0 0 32 32" className="size-8">
      <rect x="1" y="1" width="30" height="30" rx="5" className="fill-chalk" />
      <path d="M8 7v18h16" fill="none" stroke="white" strokeWidth="3" strokeLinecap="square" />
      <path d="M13 25v-4M18 25v-6M23 25v-4" stroke="white" strokeWidth="1.6" />
    </svg>
  );
}
