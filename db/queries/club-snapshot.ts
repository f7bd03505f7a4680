import "server-only";
import type Database from "better-sqlite3";
import type { Db } from "@/db/client";
import { LruCache } from "@/lib/cache/lru";

// Reads that many requests make and few writes change (the flight line above all) are kept per
// club as a snapshot, keyed by the club's data version: a counter in club_data_version that
// triggers on every relevant table bump inside the writing transaction (migration 0018), so
// no write path can forget it. A read asks for the version (one primary-key read) and serves
// the snapshot when it was built at that version, for the same key (the club's date and
// settings) and within its validity (a grounding notice taking effect at a given instant).
// Snapshots live in this process only, in a bounded LRU per database connection; a second
// process keeps its own and sees the same versions. Inside a transaction nothing is cached or
// served from the cache: the transaction may see its own writes and still roll back.

export type Snapshot<T> = { value: T; bytes: number; validFrom?: number; validUntil?: number };

type Entry = { version: number; key: string; snapshot: Snapshot<unknown> };

const LIMITS = { maxEntries: 2_000, maxBytes: 96 * 1024 * 1024 };

const caches = new WeakMap<Database.Database, LruCache<string, Entry>>();
const versionReads = new WeakMap<Database.Database, Database.Statement>();

function clientOf(db: Db): Database.Database | undefined {
  return (db as Partial<Db>).$client;
}

/** The club's data version (0 before its first recorded write). */
export function clubDataVersion(db: Db, clubId: string): number {
  const client = clientOf(db);
  if (!client) throw new Error("clubDataVersion needs the database handle, not a transaction");
  let read = versionReads.get(client);
  if (!read) {
    read = client.prepare("SELECT version FROM club_data_version WHERE club_id = ?").pluck();
    versionReads.set(client, read);
  }
  return (read.get(clubId) as number | undefined) ?? 0;
}

/**
 * The snapshot `name` of a club for `key` at the club's current data version, built by `build`
 * when there is none (or it no longer holds at `nowMs`).
 */
export function clubSnapshot<T>(db: Db, name: string, clubId: string, key: string, nowMs: number, build: () => Snapshot<T>): Snapshot<T> {
  const client = clientOf(db);
  if (!client || client.inTransaction) return build();
  const version = clubDataVersion(db, clubId);
  let cache = caches.get(client);
  if (!cache) {
    cache = new LruCache<string, Entry>(LIMITS);
    caches.set(client, cache);
  }
  const cacheKey = `${name}\u0000${clubId}`;
  const hit = cache.get(cacheKey);
  if (hit && hit.version === version && hit.key === key && nowMs >= (hit.snapshot.validFrom ?? -Infinity) && nowMs < (hit.snapshot.validUntil ?? Infinity)) {
    return hit.snapshot as Snapshot<T>;
  }
  const snapshot = build();
  cache.set(cacheKey, { version, key, snapshot }, snapshot.bytes);
  return snapshot;
}

/** Forgets every snapshot of this connection (tests that rewrite a database behind the triggers). */
export function clearClubSnapshots(db: Db): void {
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
