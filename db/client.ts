import Database from "better-sqlite3";
import { drizzle, type BetterSQLite3Database } from "drizzle-orm/better-sqlite3";
import fs from "node:fs";
import path from "node:path";
import * as schema from "./schema";

export type Db = BetterSQLite3Database<typeof schema> & { $client: Database.Database };
/** The handle passed to a transaction body; same query API as Db. */
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

export const DEFAULT_DATABASE_FILE = "./data/hangarline.db";

export function databaseFile(): string {
  const url = process.env.DATABASE_URL ?? DEFAULT_DATABASE_FILE;
  return url.startsWith("file:") ? url.slice("file:".length) : url;
}

export function openDatabase(file: string = databaseFile()): Db {
  if (file !== ":memory:") fs.mkdirSync(path.dirname(path.resolve(file)), { recursive: true });
  const sqlite = new Database(file);
  sqlite.pragma("journal_mode = WAL");
  sqlite.pragma("foreign_keys = ON");
  sqlite.pragma("busy_timeout = 5000");
  sqlite.pragma("synchronous = NORMAL");
  return drizzle(sqlite, { schema }) as Db;
}

// One connection per process; kept on globalThis so that dev-mode reloads reuse it.
const holder = globalThis as unknown as { __hangarlineDb?: { file: string; db: Db } };

export function getDb(): Db {
  const file = databaseFile();
  if (!holder.__hangarlineDb || holder.__hangarlineDb.file !== file) {
    holder.__hangarlineDb = { file, db: openDatabase(file) };
  }
  return holder.__hangarlineDb.db;
}

export function closeDb(): void {
  holder.__hangarlineDb?.db.$client.close();
  holder.__hangarlineDb = undefined;
}
