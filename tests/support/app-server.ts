import { spawn, type ChildProcess } from "node:child_process";
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { prepareDatabase } from "@/lib/setup";
import { whenHealthy } from "./child-service";
import { freePort } from "./free-port";

export type RunningApp = { url: string; databasePath: string; secret: string; stop: () => Promise<void> };

// Test runners are started from the project root by the npm scripts.
const root = process.cwd();

/**
 * Starts the built app (`next build` must have run) on a free loopback port with its
 * own freshly migrated SQLite file in a temp folder — never the demo database.
 */
export async function startApp({ seed = true, env: extraEnv = {} }: { seed?: boolean; env?: Record<string, string> } = {}): Promise<RunningApp> {
  if (!fs.existsSync(path.join(root, process.env.NEXT_DIST_DIR ?? ".next", "BUILD_ID"))) {
    throw new Error("No production build found: run `npm run build` first (npm test does it for you).");
  }
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sixteenths-test-"));
  const databasePath = path.join(dir, "test.sqlite");
  await prepareDatabase(databasePath, { seed, bcryptCost: 10 });

  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const secret = crypto.randomBytes(32).toString("base64url");
  const child: ChildProcess = spawn(process.execPath, [path.join(root, "node_modules/next/dist/bin/next"), "start", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: root,
    env: { ...process.env, NODE_ENV: "production", DATABASE_PATH: databasePath, NEXTAUTH_SECRET: secret, NEXTAUTH_URL: url, BCRYPT_COST: "10", ...extraEnv },
    stdio: ["ignore", "pipe", "pipe"],
  });
  const stop = await whenHealthy(child, { name: "The app", dir, healthUrl: `${url}/api/health`, withinMs: 30_000, pollMs: 200 });
  return { url, databasePath, secret, stop };
}
