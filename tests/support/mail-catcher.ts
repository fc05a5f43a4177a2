import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { whenHealthy } from "./child-service";
import { freePort } from "./free-port";

export type CaughtMail = {
  id: string;
  subject: string;
  text: string;
  html: string;
  to: { address: string; name?: string }[];
  date: string;
};

export type MailCatcher = { smtpUrl: string; apiUrl: string; stop: () => Promise<void> };

const root = process.cwd();

/** Starts maildev (a real SMTP server with an HTTP API) on free loopback ports for one test run. */
export async function startMailCatcher(): Promise<MailCatcher> {
  const [smtp, web] = [await freePort(), await freePort()];
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sixteenths-mail-"));
  const child: ChildProcess = spawn(
    process.execPath,
    [path.join(root, "node_modules/maildev/dist/bin/maildev.js"), "--ip", "127.0.0.1", "--web-ip", "127.0.0.1", "-s", String(smtp), "-w", String(web), "--mail-directory", dir, "--silent"],
    { stdio: ["ignore", "ignore", "pipe"] },
  );
  const apiUrl = `http://127.0.0.1:${web}`;
  // A loaded machine (a build running beside the tests) can take well over 20 s to start it.
  const stop = await whenHealthy(child, { name: "maildev", dir, healthUrl: `${apiUrl}/api/healthz`, withinMs: 60_000, pollMs: 100 });
  return { smtpUrl: `smtp://127.0.0.1:${smtp}`, apiUrl, stop };
}

/** Every message the catcher holds, newest last. */
export async function caughtMail(apiUrl: string): Promise<CaughtMail[]> {
  const res = await fetch(`${apiUrl}/api/email`);
  if (!res.ok) throw new Error(`maildev answered ${res.status}`);
  return (await res.json()) as CaughtMail[];
}

/**
 * Waits until a message to `address` (whose subject matches, when given) has arrived; mail is
 * delivered after the action commits, so a test polls rather than expecting it at once.
 */
export async function waitForMail(apiUrl: string, address: string, subject?: RegExp, timeoutMs = 15_000): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  const wanted = address.toLowerCase();
  while (Date.now() < deadline) {
    const found = (await caughtMail(apiUrl)).filter((m) => m.to.some((t) => t.address.toLowerCase() === wanted) && (!subject || subject.test(m.subject)));
    if (found.length > 0) return found[found.length - 1];
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`No e-mail to ${address}${subject ? ` matching ${subject}` : ""} arrived within ${timeoutMs} ms.`);
}

/** The first link in a message's text body that starts with `prefix`. */
export function linkIn(mail: CaughtMail, prefix: string): string {
  const match = mail.text.match(new RegExp(`${prefix.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}\\S+`));
  if (!match) throw new Error(`No link starting with ${prefix} in "${mail.subject}":\n${mail.text}`);
  return match[0];
}
