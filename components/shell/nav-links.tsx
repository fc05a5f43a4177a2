"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { useSidewaysOverflow } from "@/components/ui/scroll-region";
import type { NavItem } from "@/lib/navigation";

// The links stay on one line at every width and scroll sideways when they do not fit: a signed-in
// role brings more links once the session is known, and a second line would push the page down.
// The scrollbar is hidden (a horizontal bar would change the header's height too); a fade at the
// cut edge shows there is more, and Tab scrolls each link into view.
export function NavLinks({ items }: { items: NavItem[] }) {
  const pathname = usePathname();
  const list = useRef<HTMLUListElement>(null);
  const overflows = useSidewaysOverflow(list, false);
  const [atEnd, setAtEnd] = useState(false);
  const readEnd = () => {
    const el = list.current;
    if (el) setAtEnd(el.scrollLeft + el.clientWidth >= el.scrollWidth - 1);
  };

  // The page's own link is brought into view when it sits past the cut.
  useEffect(() => {
    const el = list.current;
    const current = el?.querySelector<HTMLElement>("[aria-current=page]");
    if (el && current && current.offsetLeft + current.offsetWidth > el.scrollLeft + el.clientWidth) el.scrollLeft = current.offsetLeft;
    readEnd();
  }, [pathname, items.length, overflows]);

  const fade = overflows && !atEnd ? "[mask-image:linear-gradient(to_right,black_calc(100%-2.5rem),transparent)]" : "";
  return (
    <ul ref={list} onScroll={readEnd} className={`relative flex flex-nowrap items-center gap-1 overflow-x-auto [scrollbar-width:none] ${fade}`} data-nav-overflows={overflows ? "yes" : "no"}>
      {items.map((item) => {
        const current = pathname === item.href || pathname.startsWith(`${item.href}/`);
        return (
          <li key={item.href} className="shrink-0">
            <Link
              href={item.href}
              aria-current={current ? "page" : undefined}
              className="inline-flex min-h-touch items-center whitespace-nowrap rounded px-3 font-semibold text-ink no-underline outline-offset-[-3px] hover:bg-paper-sunk aria-[current=page]:bg-chalk-light aria-[current=page]:text-chalk-dark"
            >
              {item.label}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
