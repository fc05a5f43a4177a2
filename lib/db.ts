import path from "node:path";
import fs from "node:fs";
import { Sequelize } from "sequelize";
import sqlite3 from "sqlite3";
import { initModels, type Models } from "@/models";
import { env } from "@/lib/env";

export type Database = { sequelize: Sequelize; models: Models };

export const CONNECTION_PRAGMAS = ["PRAGMA journal_mode = WAL", "PRAGMA busy_timeout = 5000", "PRAGMA foreign_keys = ON"];

/**
 * Opens a SQLite file with the settings every connection needs: WAL so readers never
 * wait for the writer, a busy timeout so concurrent writers queue instead of failing,
 * and foreign keys enforced.
 */
export function openDatabase(storage: string): Database {
  const file = path.resolve(storage);
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const sequelize = new Sequelize({
    dialect: "sqlite",
    dialectModule: sqlite3,
    storage: file,
    logging: false,
    define: { underscored: true },
    hooks: {
      afterConnect: async (connection) => {
        const db = connection as unknown as sqlite3.Database;
        for (const pragma of CONNECTION_PRAGMAS) {
          await new Promise<void>((resolve, reject) => db.run(pragma, (err) => (err ? reject(err) : resolve())));
        }
      },
    },
  });
  return { sequelize, models: initModels(sequelize) };
}

// One instance per server process; cached on globalThis so dev hot reloads reuse it.
const holder = globalThis as typeof globalThis & { __sixteenthsDb?: Database };

export function db(): Database {
  holder.__sixteenthsDb ??= openDatabase(env().DATABASE_PATH);
  return holder.__sixteenthsDb;
}

