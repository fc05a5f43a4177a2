"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import type { NavItem } from "@/lib/navigation";

export function NavLinks({ items }: { items: NavItem[] }) {
  const pathname = usePathname();
  return (
    <ul className="flex flex-wrap items-center gap-1">
      {items.map((item) => {
        const current = pathname === item.href || pathname.startsWith(`${item.href}/`);
        return (
          <li key={item.href}>
            <Link
              href={item.href}
              aria-current={current ? "page" : undefined}
              className="inline-flex min-h-touch items-center rounded px-3 font-semibold text-ink no-underline hover:bg-paper-sunk aria-[current=page]:bg-chalk-light aria-[current=page]:text-chalk-dark"
            >
              {item.label}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
