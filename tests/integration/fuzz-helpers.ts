// Shared by the fuzz tests: a seeded random generator (a failure names its seed and case, so it
// reproduces), the malformed values thrown at every input, and a fingerprint of every table so
// that "nothing was written" is checked on the whole database, not on the tables a test expects.
import fs from "node:fs";
import path from "node:path";
import { seedBookings } from "@/db/seed/bookings";
import { seedFleet } from "@/db/seed/fleet";
import { seedMoney } from "@/db/seed/money";
import { seedSafety } from "@/db/seed/safety";
import { and, eq } from "drizzle-orm";
import { clubs, memberships, users } from "@/db/schema";
import { uploadDir } from "@/lib/storage";
import type { Role } from "@/permissions/roles";
import { db, seedOnce } from "./helpers";

export const ROOT = path.resolve(import.meta.dirname, "../..");

/** mulberry32: small, fast, and the same sequence for the same seed on every machine. */
export function rng(seed: number) {
  let a = seed >>> 0;
  const next = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    next,
    int: (n: number) => Math.floor(next() * n),
    pick: <T>(items: readonly T[]): T => items[Math.floor(next() * items.length)]!,
    chance: (p: number) => next() < p,
  };
}
export type Rng = ReturnType<typeof rng>;

export function seedFromEnv(fallback: number): number {
  const v = Number(process.env.FUZZ_SEED);
  return Number.isInteger(v) && v > 0 ? v : fallback;
}

let seededAll = false;
/** The whole invented demo scenario (people, fleet, safety, money, bookings), once per file. */
export async function seedAllOnce() {
  const foundation = await seedOnce();
  if (!seededAll) {
    seedFleet(db(), foundation);
    seedSafety(db(), foundation);
    seedMoney(db(), foundation);
    seedBookings(db(), foundation);
    seededAll = true;
  }
  return foundation;
}

/**
 * The demo admin also holds the treasurer, safety, maintenance and instructor roles here, so one
 * signed-in person reaches past the permission check of nearly every action and handler.
 */
export const BROAD_USER = "admin@hangarline.test";
export const PLAIN_MEMBER = "member@hangarline.test";
export const FUZZ_CLUB = "reedwater";

export function widenAdminRoles(): void {
  const user = db().select().from(users).where(eq(users.email, BROAD_USER)).get()!;
  const club = db().select().from(clubs).where(eq(clubs.slug, FUZZ_CLUB)).get()!;
  const roles: Role[] = ["member", "admin", "treasurer", "safety", "maintenance", "instructor"];
  db().update(memberships).set({ roles }).where(and(eq(memberships.userId, user.id), eq(memberships.clubId, club.id))).run();
}

export const HUGE = "x".repeat(100_001);
export const HUGE_UNICODE = "\u{1F6E9}".repeat(30_000);

/** Dates every date field must refuse: out of range, impossible, or not a date at all. */
export const BAD_DATES = ["0000-01-01", "9999-12-31", "2026-02-30", "1899-12-31", "2201-01-01", "2026-13-01", "2026-00-10", "26-01-01", "2026-1-1", "2026-05-01T00:00:00Z", "01/05/2026"];
export const BAD_DATETIMES = ["0000-01-01T10:00", "9999-12-31T23:59", "2026-02-30T10:00", "2026-05-01T24:00", "2026-05-01T10:60", "2026-05-01", "2026-05-01 10:00", "+275760-09-13T00:00"];
export const BAD_MONTHS = ["0000-01", "9999-12", "2026-13", "2026-00", "2026-1", "202605", "2026-05-01", "-2026-05"];
export const BAD_IDS = ["x".repeat(65), "../../etc/passwd", "' OR 1=1 --", "a b", "\u0000", "__proto__", "%00", "id;DROP TABLE users", HUGE];

/** Values that are wrong for most fields; each field keeps only those its own schema refuses. */
export const GENERIC_BAD = [
  "", " ", "-1", "-0.01", "-99999999999", "NaN", "Infinity", "-Infinity", "1e309", "0x1F", "9".repeat(400), "1.123456789",
  "true", "null", "undefined", "[object Object]", '{"__proto__":{"polluted":true}}', "<script>alert(1)</script>",
  ...BAD_DATES.slice(0, 3), ...BAD_MONTHS.slice(0, 2), ...BAD_IDS.slice(0, 4), HUGE, HUGE_UNICODE,
];

export const POLLUTION_KEYS = ["__proto__", "constructor", "prototype", "__proto__[polluted]", "constructor.prototype.polluted"];

type TableInfo = { name: string; hasUpdatedAt: boolean };
let tables: TableInfo[] | null = null;

function listTables(): TableInfo[] {
  const sqlite = db().$client;
  const names = (sqlite.prepare("select name from sqlite_master where type = 'table' and name not like 'sqlite_%' and name not like '__drizzle%' order by name").all() as { name: string }[]).map((r) => r.name);
  return names.map((name) => ({ name, hasUpdatedAt: (sqlite.prepare(`pragma table_info("${name}")`).all() as { name: string }[]).some((c) => c.name === "updated_at") }));
}

/** Row count (and latest update) of every table, and the number of stored files. */
export function fingerprint(): Record<string, string> {
  tables ??= listTables();
  const sqlite = db().$client;
  const parts = tables.map((t) => `(select count(*) || ':' || ${t.hasUpdatedAt ? "coalesce(max(updated_at), '')" : "''"} from "${t.name}") as "${t.name}"`);
  const row = sqlite.prepare(`select ${parts.join(", ")}`).get() as Record<string, string>;
  const dir = uploadDir();
  return { ...row, "(files on disk)": String(fs.existsSync(dir) ? fs.readdirSync(dir).length : 0) };
}

export function changedTables(before: Record<string, string>, after: Record<string, string>): string[] {
  return Object.keys(after).filter((k) => before[k] !== after[k]);
}

/** Up to `per` real ids from every table with an id column: lookups that exist, for depth. */
export function realIds(per = 3): Record<string, string[]> {
  tables ??= listTables();
  const sqlite = db().$client;
  const out: Record<string, string[]> = {};
  for (const t of tables) {
    const cols = (sqlite.prepare(`pragma table_info("${t.name}")`).all() as { name: string }[]).map((c) => c.name);
    if (!cols.includes("id")) continue;
    const ids = (sqlite.prepare(`select id from "${t.name}" order by rowid limit ${per}`).all() as { id: string }[]).map((r) => String(r.id));
    if (ids.length) out[t.name] = ids;
  }
  return out;
}

/** The table a field or parameter's id points into, guessed from its name (aircraftId → aircraft, entryId → journal_entries). */
export function idsFor(field: string, ids: Record<string, string[]>): string[] {
  if (/user|member|pilot|instructor/i.test(field) && !/membership/i.test(field)) return ids.users ?? [];
  const stem = field.replace(/Ids?$/, "").replace(/([a-z])([A-Z])/g, "$1_$2").toLowerCase().replace(/y$/, "");
  const table = Object.keys(ids).find((t) => t === stem || t.startsWith(stem) || t.endsWith(stem) || t.includes(`_${stem}`) || t.includes(stem));
  return table ? ids[table]! : [];
}

export function walk(dir: string, match: (file: string) => boolean): string[] {
  const out: string[] = [];
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) out.push(...walk(full, match));
    else if (match(full)) out.push(full);
  }
  return out.sort();
}

export function prototypeIsClean(): boolean {
  return !("polluted" in Object.prototype) && !("polluted" in ({} as Record<string, unknown>));
}
