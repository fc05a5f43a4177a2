"use client";

import { useEffect, useRef, useState, type ReactNode, type RefObject } from "react";

/** True while the element is wider inside than it is on screen, re-measured whenever it or its content resizes. */
export function useSidewaysOverflow(ref: RefObject<HTMLElement | null>, initial = true): boolean {
  const [overflows, setOverflows] = useState(initial);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    // A pixel of slack: rounding of fractional widths can make an exact fit look one pixel too wide.
    const measure = () => setOverflows(el.scrollWidth > el.clientWidth + 1);
    const resizes = new ResizeObserver(measure);
    const watchChildren = () => {
      resizes.observe(el);
      for (const child of Array.from(el.children)) resizes.observe(child);
    };
    // Content added later (the header's links once the session is known) is watched too.
    const additions = new MutationObserver(() => {
      watchChildren();
      measure();
    });
    additions.observe(el, { childList: true });
    watchChildren();
    measure();
    return () => {
      resizes.disconnect();
      additions.disconnect();
    };
  }, [ref]);
  return overflows;
}

type Props = {
  children: ReactNode;
  /** The id of a caption or heading that names the region; or give `label`. */
  labelledBy?: string;
  /** The region's name when nothing on the page names it. */
  label?: string;
  /** The box's classes; a card that scrolls sideways unless told otherwise. */
  className?: string;
  /** data-* attributes for the box, which tests and print rules find it by. */
  data?: Record<`data-${string}`, string | number>;
};

/**
 * A box that scrolls a wide table sideways on a narrow screen. While it is wider inside than on
 * screen it is a named region and a stop in the tab order, so a keyboard user can scroll it with
 * the arrow keys and a screen reader says what it holds; when everything fits it is a plain box,
 * so a table that fits adds no empty tab stop. It starts out reachable (before the page's script
 * runs, the server cannot know the screen's width).
 */
export function ScrollRegion({ children, labelledBy, label, className = "card", data }: Props) {
  const box = useRef<HTMLDivElement>(null);
  const overflows = useSidewaysOverflow(box);
  const reachable = overflows ? { tabIndex: 0, role: "region", "aria-labelledby": labelledBy, "aria-label": labelledBy ? undefined : label } : {};
  return (
    <div ref={box} className={`overflow-x-auto ${className}`} data-scroll-region={overflows ? "scrolls" : "fits"} {...reachable} {...data}>
      {children}
    </div>
  );
}
