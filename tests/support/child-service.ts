import type { ChildProcess } from "node:child_process";
import fs from "node:fs";

type Readiness = {
  /** How the errors name it, e.g. "The app". */
  name: string;
  /** Its temp folder, removed when it stops. */
  dir: string;
  /** Answers 2xx once it is ready. */
  healthUrl: string;
  withinMs: number;
  pollMs: number;
};

/**
 * Waits until a just-spawned test service answers its health URL, then returns how to stop it
 * (the process ends, its temp folder goes). One that exits first, or does not answer in time,
 * fails with everything it printed, since that is the only clue to why.
 */
export async function whenHealthy(child: ChildProcess, { name, dir, healthUrl, withinMs, pollMs }: Readiness): Promise<() => Promise<void>> {
  let output = "";
  child.stdout?.on("data", (d) => (output += d));
  child.stderr?.on("data", (d) => (output += d));
  const stop = async () => {
    if (child.exitCode === null) {
      child.kill("SIGTERM");
      await new Promise((resolve) => child.once("exit", resolve));
    }
    fs.rmSync(dir, { recursive: true, force: true });
  };

  const deadline = Date.now() + withinMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`${name} exited during start-up:\n${output}`);
    try {
      if ((await fetch(healthUrl)).ok) return stop;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, pollMs));
  }
  await stop();
  throw new Error(`${name} did not answer ${new URL(healthUrl).pathname} within ${withinMs / 1000} s:\n${output}`);
}
