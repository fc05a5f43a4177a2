"use client";

import { useSyncExternalStore } from "react";

const PHONE = "(max-width: 639px)";
// On the printed shop sheet the elevation shares the page with the tables, so it is drawn small.
const PHONE_OR_PAPER = `${PHONE}, print`;

function watch(query: string) {
  return (onChange: () => void) => {
    const media = window.matchMedia(query);
    media.addEventListener("change", onChange);
    return () => media.removeEventListener("change", onChange);
  };
}
const watchers = { [PHONE]: watch(PHONE), [PHONE_OR_PAPER]: watch(PHONE_OR_PAPER) };

/**
 * True on a phone-width screen (and, with `onPaper`, when printing). Drawings then draw on
 * a narrower canvas, so their labels come out large enough to read in the shop; the server
 * and the first paint assume a wide screen.
 */
export function useNarrowCanvas({ onPaper = false }: { onPaper?: boolean } = {}): boolean {
  const query = onPaper ? PHONE_OR_PAPER : PHONE;
  return useSyncExternalStore(watchers[query], () => window.matchMedia(query).matches, () => false);
}
