// An online backup of the SQLite file. `VACUUM INTO` writes the whole database as one read
// transaction sees it: under WAL that is a single consistent snapshot, and the app's writers go on
// committing while it runs (readers never block the writer). It is one statement with no restart
// loop (the step-wise backup API starts over whenever another connection writes, which under
// steady answers can take a long time), and the copy comes out compact, without a -wal file, ready
// to copy back. Photos are files beside the database; they are copied after the snapshot, so every
// photo the snapshot names is already on disk.
import fs from "node:fs";
import path from "node:path";
import sqlite3 from "sqlite3";

export type BackupResult = {
  file: string;
  bytes: number;
  integrity: string;
  tables: { name: string; rows: number }[];
  /** The copied photo folder and how many files it holds; null when the database has none beside it. */
  uploads: { folder: string; files: number } | null;
};

function open(file: string, mode: number): Promise<sqlite3.Database> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(file, mode, (error) => (error ? reject(error) : resolve(db)));
  });
}

const all = <T>(db: sqlite3.Database, sql: string, params: unknown[] = []) =>
  new Promise<T[]>((resolve, reject) => db.all<T>(sql, params, (error, rows) => (error ? reject(error) : resolve(rows))));
const close = (db: sqlite3.Database) => new Promise<void>((resolve, reject) => db.close((error) => (error ? reject(error) : resolve())));

/** `sixteenths-backup-20261202-093512Z.sqlite`: sorts by time, and says it is UTC. */
function backupName(source: string, now: Date, folder: string): string {
  const stamp = now.toISOString().replace(/[-:]/g, "").replace("T", "-").replace(/\.\d+Z$/, "Z");
  const base = path.basename(source).replace(/\.sqlite3?$|\.db$/, "");
  for (let n = 1; ; n++) {
    const file = path.join(folder, `${base}-backup-${stamp}${n === 1 ? "" : `-${n}`}.sqlite`);
    if (!fs.existsSync(file) && !fs.existsSync(`${file}-uploads`)) return file;
  }
}

/** Backs up `source` (which may be in use) into `folder` (default: beside it), checks the copy and counts its rows. */
export async function backupDatabase(source: string, folder = path.dirname(path.resolve(source)), now = new Date()): Promise<BackupResult> {
  const from = path.resolve(source);
  if (!fs.existsSync(from)) throw new Error(`No database at ${from}.`);
  fs.mkdirSync(folder, { recursive: true });
  const file = backupName(from, now, path.resolve(folder));

  const live = await open(from, sqlite3.OPEN_READWRITE);
  try {
    // Wait out a writer's lock instead of failing; the snapshot itself never blocks the writer.
    await all(live, "PRAGMA busy_timeout = 10000");
    await all(live, "VACUUM INTO ?", [file]);
  } finally {
    await close(live);
  }

  const copy = await open(file, sqlite3.OPEN_READONLY);
  let integrity: string;
  let tables: BackupResult["tables"];
  try {
    integrity = (await all<{ integrity_check: string }>(copy, "PRAGMA integrity_check")).map((r) => r.integrity_check).join("; ");
    const names = await all<{ name: string }>(copy, "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name");
    tables = [];
    for (const { name } of names) {
      const [{ rows }] = await all<{ rows: number }>(copy, `SELECT COUNT(*) AS rows FROM "${name.replace(/"/g, '""')}"`);
      tables.push({ name, rows });
    }
  } finally {
    await close(copy);
  }

  const photos = path.join(path.dirname(from), "uploads");
  let uploads: BackupResult["uploads"] = null;
  if (fs.existsSync(photos)) {
    const target = `${file}-uploads`;
    fs.cpSync(photos, target, { recursive: true });
    uploads = { folder: target, files: fs.readdirSync(target).length };
  }
  return { file, bytes: fs.statSync(file).size, integrity, tables, uploads };
}
