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

const STATEMENT_CACHE_SIZE = 500;

/**
 * The connection as the query builder sees it: `prepare` returns a statement already prepared
 * for the same SQL text (SQLite compiles each text once, not on every query), reset to its
 * default result mode; a statement still busy (an iteration under way) is never handed out
 * twice. At most STATEMENT_CACHE_SIZE statements are kept, the least recently used dropped.
 */
function withStatementCache(sqlite: Database.Database): Database.Database {
  const cache = new Map<string, Database.Statement>();
  const prepare = (source: string): Database.Statement => {
    const kept = cache.get(source);
    if (kept && !kept.busy) {
      cache.delete(source);
      cache.set(source, kept);
      if (kept.reader) kept.raw(false).pluck(false).expand(false);
      return kept;
    }
    const statement = sqlite.prepare(source);
    if (kept) return statement; // the kept one is busy: this one is used once, not kept
    cache.set(source, statement);
    if (cache.size > STATEMENT_CACHE_SIZE) cache.delete(cache.keys().next().value as string);
    return statement;
  };
  return new Proxy(sqlite, {
    get(target, prop) {
      if (prop === "prepare") return prepare;
      const value = Reflect.get(target, prop, target) as unknown;
      return typeof value === "function" ? (value as (...args: unknown[]) => unknown).bind(target) : value;
    },
  });
}

export function openDatabase(file: string = databaseFile()): Db {
  if (file !== ":memory:") fs.mkdirSync(path.dirname(path.resolve(file)), { recursive: true });
  const sqlite = new Database(file);
  sqlite.pragma("journal_mode = WAL");
  sqlite.pragma("foreign_keys = ON");
  sqlite.pragma("busy_timeout = 5000");
  sqlite.pragma("synchronous = NORMAL");
  return drizzle(withStatementCache(sqlite), { schema }) as Db;
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
