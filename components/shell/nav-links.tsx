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
  const [edges, setEdges] = useState({ atStart: true, atEnd: false });
  const readEdges = () => {
    const el = list.current;
    if (el) setEdges({ atStart: el.scrollLeft <= 1, atEnd: el.scrollLeft + el.clientWidth >= el.scrollWidth - 1 });
  };

  // The page's own link is brought just into view when it sits past the cut, so the links before
  // it stay in sight as far as they can.
  useEffect(() => {
    const el = list.current;
    const current = el?.querySelector<HTMLElement>("[aria-current=page]");
    const rightEdge = current ? current.offsetLeft + current.offsetWidth : 0;
    // 40 px past it keeps the link clear of the fade at the cut edge.
    if (el && current && rightEdge > el.scrollLeft + el.clientWidth) el.scrollLeft = rightEdge - el.clientWidth + 40;
    readEdges();
  }, [pathname, items.length, overflows]);

  // Whole class names, so the style sheet is built with each of them.
  const fade = !overflows
    ? ""
    : edges.atStart
      ? "[mask-image:linear-gradient(to_right,black_calc(100%-2.5rem),transparent)]"
      : edges.atEnd
        ? "[mask-image:linear-gradient(to_right,transparent,black_2.5rem)]"
        : "[mask-image:linear-gradient(to_right,transparent,black_2.5rem,black_calc(100%-2.5rem),transparent)]";
  return (
    <ul ref={list} onScroll={readEdges} className={`relative flex flex-nowrap items-center gap-1 overflow-x-auto [scrollbar-width:none] ${fade}`} data-nav-overflows={overflows ? "yes" : "no"}>
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
