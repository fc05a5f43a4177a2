"use client";

import { useHydrated } from "./use-hydrated";

const styles = {
  date: { dateStyle: "medium" },
  "date-time": { dateStyle: "medium", timeStyle: "short" },
  weekday: { weekday: "short", month: "short", day: "numeric", hour: "numeric", minute: "2-digit" },
} satisfies Record<string, Intl.DateTimeFormatOptions>;

/**
 * A date in the reader's own time zone. The server does not know that zone, so the first render
 * says UTC and the browser replaces it after hydration; `dateTime` always carries the exact instant.
 */
export function LocalTime({ iso, style = "date-time", className }: { iso: string; style?: keyof typeof styles; className?: string }) {
  const hydrated = useHydrated();
  const date = new Date(iso);
  const text = hydrated
    ? new Intl.DateTimeFormat("en-US", styles[style]).format(date)
    : `${new Intl.DateTimeFormat("en-US", { ...styles[style], timeZone: "UTC" }).format(date)}${style === "date" ? "" : " UTC"}`;
  return (
    <time dateTime={iso} className={className} title={date.toISOString()}>
      {text}
    </time>
  );
}

/** `YYYY-MM-DDTHH:mm` for an <input type="datetime-local"> from an ISO instant, in the browser's zone. */
export function toLocalInput(iso: string): string {
  const d = new Date(iso);
  const pad = (n: number) => String(n).padStart(2, "0");
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

/** The ISO instant (with offset) for a datetime-local value typed in the browser's zone; "" stays "". */
export function fromLocalInput(value: string): string {
  if (!value) return "";
  const d = new Date(value);
  return Number.isNaN(d.getTime()) ? value : d.toISOString();
}
