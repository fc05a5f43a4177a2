import { env } from "@/lib/env";

/** An absolute address in the app for a link in an e-mail; NEXTAUTH_URL may carry a path prefix. */
export function appLink(path: string): string {
  return `${env().NEXTAUTH_URL.replace(/\/+$/, "")}${path.startsWith("/") ? path : `/${path}`}`;
}

/** "Friday, March 14, 2027 at 5:00 PM UTC": a mail cannot know the reader's time zone, so it says which one it uses. */
export function utcWritten(at: Date): string {
  const date = new Intl.DateTimeFormat("en-US", { timeZone: "UTC", weekday: "long", month: "long", day: "numeric", year: "numeric" }).format(at);
  const time = new Intl.DateTimeFormat("en-US", { timeZone: "UTC", hour: "numeric", minute: "2-digit", hour12: true }).format(at);
  return `${date} at ${time} UTC`;
}
