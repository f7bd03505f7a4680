import "server-only";
import type Database from "better-sqlite3";
import type { Db, Tx } from "@/db/client";
import { LruCache } from "@/lib/cache/lru";

// Reads that many requests make and few writes change (the flight line above all) are kept per
// club as a snapshot, keyed by the club's data version: a counter in club_data_version that
// triggers on every relevant table bump inside the writing transaction (migration 0018), so
// no write path can forget it. A read asks for the version (one primary-key read) and serves
// the snapshot when it was built at that version, for the same key (the club's date and
// settings) and within its validity (a grounding notice taking effect at a given instant).
// Snapshots live in this process only, in a bounded LRU per database connection; a second
// process keeps its own and sees the same versions. Inside a transaction a kept snapshot is
// served only while the version the transaction sees is the one it was built at (a write of
// the transaction's own has moved it), and nothing built there is kept: it may roll back.

export type Snapshot<T> = { value: T; bytes: number; validFrom?: number; validUntil?: number };

type Entry = { version: number; key: string; snapshot: Snapshot<unknown> };

const LIMITS = { maxEntries: 2_000, maxBytes: 96 * 1024 * 1024 };

const caches = new WeakMap<Database.Database, LruCache<string, Entry>>();
const versionReads = new WeakMap<Database.Database, Database.Statement>();

/** The connection's query session, the same object for the database handle and its transactions. */
export function sessionOf(db: Db | Tx): object {
  return (db as unknown as { session: object }).session;
}

/** The better-sqlite3 connection under a database handle or one of its transactions. */
export function sqliteOf(db: Db | Tx): Database.Database {
  const client = (db as Partial<Db>).$client ?? (sessionOf(db) as { client?: Database.Database }).client;
  if (!client) throw new Error("No SQLite connection under this handle");
  return client;
}

function clientOf(db: Db | Tx): Database.Database | undefined {
  return (db as Partial<Db>).$client ?? (sessionOf(db) as { client?: Database.Database } | undefined)?.client;
}

/** The club's data version (0 before its first recorded write), as this connection sees it. */
export function clubDataVersion(db: Db | Tx, clubId: string): number {
  return versionOn(sqliteOf(db), clubId);
}

function versionOn(client: Database.Database, clubId: string): number {
  let read = versionReads.get(client);
  if (!read) {
    read = client.prepare("SELECT version FROM club_data_version WHERE club_id = ?");
    versionReads.set(client, read);
  }
  // The connection keeps one statement per SQL text: set the result mode on every use.
  return (read.pluck(true).get(clubId) as number | undefined) ?? 0;
}

function holds(hit: Entry | undefined, version: number, key: string, nowMs: number): hit is Entry {
  return Boolean(hit && hit.version === version && hit.key === key && nowMs >= (hit.snapshot.validFrom ?? -Infinity) && nowMs < (hit.snapshot.validUntil ?? Infinity));
}

function cacheFor(client: Database.Database): LruCache<string, Entry> {
  let cache = caches.get(client);
  if (!cache) {
    cache = new LruCache<string, Entry>(LIMITS);
    caches.set(client, cache);
  }
  return cache;
}

/**
 * The kept snapshot `name` of a club for `key`, when it still holds at the club's current data
 * version and at `nowMs`; otherwise undefined. Safe inside a transaction: a transaction that
 * wrote to the club's records has moved the version it sees past every kept snapshot.
 */
export function peekClubSnapshot<T>(db: Db | Tx, name: string, clubId: string, key: string, nowMs: number): Snapshot<T> | undefined {
  const client = clientOf(db);
  if (!client) return undefined;
  const hit = caches.get(client)?.get(`${name}\u0000${clubId}`);
  return holds(hit, versionOn(client, clubId), key, nowMs) ? (hit.snapshot as Snapshot<T>) : undefined;
}

/**
 * The snapshot `name` of a club for `key` at the club's current data version, built by `build`
 * when there is none (or it no longer holds at `nowMs`). A snapshot built inside a transaction
 * is served to that caller only, never kept: the transaction may roll back.
 */
export function clubSnapshot<T>(db: Db | Tx, name: string, clubId: string, key: string, nowMs: number, build: () => Snapshot<T>): Snapshot<T> {
  const client = clientOf(db);
  if (!client) return build();
  const version = versionOn(client, clubId);
  const cache = cacheFor(client);
  const cacheKey = `${name}\u0000${clubId}`;
  const hit = cache.get(cacheKey);
  if (holds(hit, version, key, nowMs)) return hit.snapshot as Snapshot<T>;
  const snapshot = build();
  if (!client.inTransaction) cache.set(cacheKey, { version, key, snapshot }, snapshot.bytes);
  return snapshot;
}

/** Forgets every snapshot of this connection (tests that rewrite a database behind the triggers). */
export function clearClubSnapshots(db: Db | Tx): void {
  const client = clientOf(db);
  if (client) caches.delete(client);
}

/** Freezes a snapshot's value all the way down: a caller that changed it would change every reader's. */
export function deepFreeze<T>(value: T): T {
  if (value && typeof value === "object" && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const v of Object.values(value)) deepFreeze(v);
  }
  return value;
}
