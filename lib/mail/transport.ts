import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/lib/env";

// No "server-only" marker here or in the outbox: `npm run reminders` and the tests load them outside Next.

const LOOPBACK = new Set(["127.0.0.1", "localhost", "::1", "[::1]"]);

/** SMTP options from SMTP_URL; a catcher on loopback speaks plain SMTP, so STARTTLS is not asked for there. */
export function smtpOptions(url: string) {
  const parsed = new URL(url);
  const secure = parsed.protocol === "smtps:";
  return {
    host: parsed.hostname,
    port: Number(parsed.port || (secure ? 465 : 587)),
    secure,
    ignoreTLS: !secure && LOOPBACK.has(parsed.hostname),
    auth: parsed.username ? { user: decodeURIComponent(parsed.username), pass: decodeURIComponent(parsed.password) } : undefined,
    // A dead SMTP server must fail a send quickly, so the outbox can retry it later.
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  };
}

/** A transport for one SMTP address; the outbox takes one of these when a caller (a test) passes its own. */
export function createTransport(url: string): Transporter {
  return nodemailer.createTransport(smtpOptions(url));
}

const holder = globalThis as typeof globalThis & { __sixteenthsMail?: { url: string; transport: Transporter } };

/** The process's transport for SMTP_URL. */
export function transport(): Transporter {
  const url = env().SMTP_URL;
  if (holder.__sixteenthsMail?.url !== url) holder.__sixteenthsMail = { url, transport: createTransport(url) };
  return holder.__sixteenthsMail.transport;
}
