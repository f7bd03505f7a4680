import "server-only";
import { randomBytes } from "node:crypto";
import { and, eq, isNotNull, isNull, sql } from "drizzle-orm";
import type { Db } from "@/db/client";
import { aircraft, groundingNotices, inspectionItems, meterConversions, squawks, type Club } from "@/db/schema";
import { isoDateInTimeZone } from "@/lib/dates";
import { buildFlightLine, type FleetRecords } from "@/lib/fleet/flight-line";
import { clubSnapshot, deepFreeze, peekClubSnapshot, sessionOf, sqliteOf } from "./club-snapshot";
import type { FleetCompletionRecord, FleetItemRecord, FlightLineEntry } from "@/lib/fleet/types";

// What the flight line needs and nothing more: the aircraft (current meters are kept on them),
// their items with the completions that govern them, open squawks and notices not lifted.
// Flights are never read.

const CHAIN_RULES: ReadonlySet<string> = new Set(["hours", "months-or-hours"]);

// Every read below is prepared once per connection (drizzle's placeholders; the completions in
// plain SQL) and reused: building and preparing the statements cost more than running them.
const P = { clubId: sql.placeholder("clubId"), aircraftId: sql.placeholder("aircraftId") };

/**
 * The completions that decide each item, read through the (aircraft_id, item_id, done_on, hours)
 * index: for a calendar, days or fixed-date item only its latest one (the due date runs from
 * it); for an hours-based item its whole history, and that of the items it borrows from
 * (satisfiedBy), because the 100-hour's carried-forward excess (14 CFR 91.409(b)) is a chain
 * through every earlier due point. "Latest" is the rules' own order: the date, then the meter
 * reading (none before any), then the order recorded.
 */
function governingCompletionsSql(one: boolean): string {
  return `
    SELECT c.id AS id, c.item_id AS itemId, c.done_on AS doneOn, c.hours AS hours, c.expires_on AS expiresOn, c.meter AS meter
    FROM inspection_items i
    JOIN inspection_completions c ON c.rowid = (
      SELECT c2.rowid FROM inspection_completions c2 WHERE c2.aircraft_id = i.aircraft_id AND c2.item_id = i.id
      ORDER BY c2.done_on DESC, c2.hours DESC, c2.rowid DESC LIMIT 1)
    WHERE i.club_id = @clubId AND i.retired_at IS NULL ${one ? "AND i.aircraft_id = @aircraftId" : ""}
      AND i.id NOT IN (SELECT value FROM json_each(@chainIds))
    UNION ALL
    SELECT c.id, c.item_id, c.done_on, c.hours, c.expires_on, c.meter
    FROM json_each(@chainIds) j
    JOIN inspection_items i ON i.id = j.value AND i.club_id = @clubId
    JOIN inspection_completions c ON c.aircraft_id = i.aircraft_id AND c.item_id = i.id`;
}

function buildFleetQueries(db: Db, one: boolean) {
  return {
    aircraft: db
      .select({
        id: aircraft.id,
        registration: aircraft.registration,
        make: aircraft.make,
        model: aircraft.model,
        typeGroup: aircraft.typeGroup,
        homeField: aircraft.homeField,
        photoUploadId: aircraft.photoUploadId,
        currentHobbs: aircraft.currentHobbs,
        currentTach: aircraft.currentTach,
        maintenanceMeter: aircraft.maintenanceMeter,
        usedForHire: aircraft.usedForHire,
        usedForInstruction: aircraft.usedForInstruction,
        ifrEquipped: aircraft.ifrEquipped,
        usedForIfr: aircraft.usedForIfr,
      })
      .from(aircraft)
      .where(and(eq(aircraft.clubId, P.clubId), isNull(aircraft.retiredAt), one ? eq(aircraft.id, P.aircraftId) : undefined))
      .orderBy(aircraft.registration)
      .prepare(),
    items: db
      .select({
        id: inspectionItems.id,
        aircraftId: inspectionItems.aircraftId,
        key: inspectionItems.key,
        name: inspectionItems.name,
        ruleKind: inspectionItems.ruleKind,
        months: inspectionItems.months,
        hours: inspectionItems.hours,
        days: inspectionItems.days,
        overrunHours: inspectionItems.overrunHours,
        required: inspectionItems.required,
        ifrOnly: inspectionItems.ifrOnly,
        hireOrInstructionOnly: inspectionItems.hireOrInstructionOnly,
        satisfiedBy: inspectionItems.satisfiedBy,
        usageLimitHours: inspectionItems.usageLimitHours,
        usageUsedHours: inspectionItems.usageUsedHours,
        source: inspectionItems.source,
      })
      .from(inspectionItems)
      .where(and(eq(inspectionItems.clubId, P.clubId), isNull(inspectionItems.retiredAt), one ? eq(inspectionItems.aircraftId, P.aircraftId) : undefined))
      .orderBy(inspectionItems.createdAt)
      .prepare(),
    completions: sqliteOf(db).prepare(governingCompletionsSql(one)),
    squawks: db
      .select({
        id: squawks.id,
        aircraftId: squawks.aircraftId,
        description: squawks.description,
        triage: squawks.triage,
        limitation: squawks.limitation,
        placarded: squawks.placarded,
        suspectedGrounding: squawks.suspectedGrounding,
        status: squawks.status,
        createdAt: squawks.createdAt,
      })
      .from(squawks)
      .where(and(eq(squawks.clubId, P.clubId), eq(squawks.status, "open"), one ? eq(squawks.aircraftId, P.aircraftId) : undefined))
      .orderBy(squawks.createdAt)
      .prepare(),
    notices: db
      .select({ id: groundingNotices.id, aircraftId: groundingNotices.aircraftId, category: groundingNotices.category, reason: groundingNotices.reason, effectiveAt: groundingNotices.effectiveAt, liftedAt: groundingNotices.liftedAt })
      .from(groundingNotices)
      .where(and(eq(groundingNotices.clubId, P.clubId), isNull(groundingNotices.liftedAt), one ? eq(groundingNotices.aircraftId, P.aircraftId) : undefined))
      .orderBy(groundingNotices.effectiveAt)
      .prepare(),
  };
}

type FleetQueries = ReturnType<typeof buildFleetQueries>;
const fleetQueries = new WeakMap<object, { club?: FleetQueries; one?: FleetQueries }>();

function queriesFor(db: Db, one: boolean): FleetQueries {
  const session = sessionOf(db);
  let prepared = fleetQueries.get(session);
  if (!prepared) fleetQueries.set(session, (prepared = {}));
  const variant = one ? "one" : "club";
  return (prepared[variant] ??= buildFleetQueries(db, one));
}

/** The chains to read whole: hours-based items and the items they borrow completions from. */
function chainItemIds(items: FleetItemRecord[]): string[] {
  const byAircraft = new Map<string, FleetItemRecord[]>();
  for (const i of items) {
    const list = byAircraft.get(i.aircraftId);
    if (list) list.push(i);
    else byAircraft.set(i.aircraftId, [i]);
  }
  const chain = new Set<string>();
  for (const list of byAircraft.values()) {
    for (const item of list) {
      if (!CHAIN_RULES.has(item.ruleKind)) continue;
      chain.add(item.id);
      const borrowed = new Set(item.satisfiedBy ?? []);
      for (const s of list) if (borrowed.has(s.key)) chain.add(s.id);
    }
  }
  return [...chain];
}

export function loadFleetRecords(db: Db, clubId: string, aircraftId?: string): FleetRecords {
  const q = queriesFor(db, Boolean(aircraftId));
  const params = aircraftId ? { clubId, aircraftId } : { clubId };
  const fleet = q.aircraft.all(params);
  if (fleet.length === 0) return { aircraft: [], items: [], completions: [], squawks: [], notices: [] };
  const ids = new Set(fleet.map((a) => a.id));
  const items = q.items.all(params);
  const completions = q.completions.raw(false).all({ ...params, chainIds: JSON.stringify(chainItemIds(items)) }) as FleetCompletionRecord[];
  // Open squawks of the fleet in service (a retired aircraft's are not on the line).
  const openSquawks = q.squawks.all(params).filter((s) => ids.has(s.aircraftId));
  const notices = q.notices.all(params);

  // i11-meter: maintenance's readings of completions on another meter (meter provenance);
  // a handful of rows at most, only after an aircraft switched meters.
  const conversions = db
    .select({ completionId: meterConversions.completionId, toMeter: meterConversions.toMeter, toReading: meterConversions.toReading })
    .from(meterConversions)
    .where(and(eq(meterConversions.clubId, clubId), isNotNull(meterConversions.completionId), aircraftId ? eq(meterConversions.aircraftId, aircraftId) : undefined))
    .orderBy(meterConversions.createdAt)
    .all()
    .flatMap((v) => (v.completionId ? [{ ...v, completionId: v.completionId }] : []));

  return {
    aircraft: fleet,
    items,
    completions,
    conversions,
    squawks: openSquawks.map(({ createdAt, ...s }) => ({ ...s, reportedAt: createdAt.toISOString() })),
    notices: notices.map((n) => ({ ...n, effectiveAt: n.effectiveAt.toISOString(), liftedAt: n.liftedAt?.toISOString() ?? null })),
  };
}

export type FlightLine = { today: string; generatedAt: string; timeZone: string; entries: FlightLineEntry[] };

function thresholds(club: Club) {
  return { days: club.settings.dueSoonDays, hours: club.settings.dueSoonHours };
}

/** The flight line computed now from the records, bypassing the snapshot (tests compare the two). */
export function computeFlightLine(db: Db, club: Club, now: Date = new Date()): FlightLine {
  const today = isoDateInTimeZone(now, club.timeZone);
  const entries = buildFlightLine(loadFleetRecords(db, club.id), today, now.toISOString(), thresholds(club), club.timeZone);
  return { today, generatedAt: now.toISOString(), timeZone: club.timeZone, entries };
}

/** A rough size of what a snapshot keeps: a few times its JSON. */
function sizeOf(value: unknown): number {
  return 4 * JSON.stringify(value).length;
}

const FLIGHT_LINE = "flight-line";
const FLEET_RECORDS = "fleet-records";

/** The club's fleet records at its data version (they do not depend on the time): kept as a snapshot. */
function fleetRecordsSnapshot(db: Db, clubId: string, nowMs: number): FleetRecords {
  return clubSnapshot<FleetRecords>(db, FLEET_RECORDS, clubId, "", nowMs, () => {
    const records = deepFreeze(loadFleetRecords(db, clubId));
    return { value: records, bytes: sizeOf(records) };
  }).value;
}

/** One aircraft's part of the club's records. */
function recordsOfAircraft(records: FleetRecords, aircraftId: string): FleetRecords {
  const items = records.items.filter((i) => i.aircraftId === aircraftId);
  const itemIds = new Set(items.map((i) => i.id));
  return {
    aircraft: records.aircraft.filter((a) => a.id === aircraftId),
    items,
    completions: records.completions.filter((c) => itemIds.has(c.itemId)),
    squawks: records.squawks.filter((s) => s.aircraftId === aircraftId),
    notices: records.notices.filter((n) => n.aircraftId === aircraftId),
  };
}

/**
 * One aircraft's records (none when it is not this club's or is retired): from the club's kept
 * snapshot when it holds at the version this handle sees (also inside a transaction that has
 * not written to the club's records), else read for that aircraft alone. Do not change them.
 */
export function loadAircraftRecords(db: Db, clubId: string, aircraftId: string, now: Date = new Date()): FleetRecords {
  const kept = peekClubSnapshot<FleetRecords>(db, FLEET_RECORDS, clubId, "", now.getTime());
  return kept ? recordsOfAircraft(kept.value, aircraftId) : loadFleetRecords(db, clubId, aircraftId);
}

type FlightLineSnapshot = { today: string; timeZone: string; entries: FlightLineEntry[]; json?: { head: string; tail: string }; etag?: string };

// Entity tags name one snapshot of this process: a random prefix per process start (a restarted
// or second process never reuses a tag for other content) and a counter per snapshot built.
const ETAG_PREFIX = randomBytes(6).toString("base64url");
let etagCounter = 0;

/**
 * A computed flight line holds while the records do not change (the club data version), on
 * the same club date, and until the next grounding notice not lifted takes effect (or back to
 * the last one that did, for a caller asking about an earlier instant).
 */
function flightLineSnapshot(db: Db, club: Club, now: Date): FlightLineSnapshot {
  const today = isoDateInTimeZone(now, club.timeZone);
  const soon = thresholds(club);
  const key = `${today}|${club.timeZone}|${soon.days}|${soon.hours}`;
  return clubSnapshot<FlightLineSnapshot>(db, FLIGHT_LINE, club.id, key, now.getTime(), () => {
    const records = fleetRecordsSnapshot(db, club.id, now.getTime());
    const line = { entries: buildFlightLine(records, today, now.toISOString(), soon, club.timeZone) };
    let validFrom = -Infinity;
    let validUntil = Infinity;
    for (const e of line.entries) {
      for (const n of e.notices) {
        const at = Date.parse(n.effectiveAt);
        if (Number.isNaN(at)) continue;
        if (at <= now.getTime()) validFrom = Math.max(validFrom, at);
        else validUntil = Math.min(validUntil, at);
      }
    }
    const entries = deepFreeze(line.entries);
    return { value: { today, timeZone: club.timeZone, entries }, bytes: sizeOf(entries), validFrom, validUntil };
  }).value;
}

/** Every aircraft's status; served from the club's snapshot while its records are unchanged. Do not change what it returns. */
export function getFlightLine(db: Db, club: Club, now: Date = new Date()): FlightLine {
  const snap = flightLineSnapshot(db, club, now);
  return { today: snap.today, generatedAt: now.toISOString(), timeZone: snap.timeZone, entries: snap.entries };
}

/** getFlightLine as JSON text (the same bytes as JSON.stringify of it), serialised once per snapshot. */
export function getFlightLineJson(db: Db, club: Club, now: Date = new Date()): string {
  const snap = flightLineSnapshot(db, club, now);
  snap.json ??= {
    head: `{"today":${JSON.stringify(snap.today)},"generatedAt":`,
    tail: `,"timeZone":${JSON.stringify(snap.timeZone)},"entries":${JSON.stringify(snap.entries)}}`,
  };
  return `${snap.json.head}${JSON.stringify(now.toISOString())}${snap.json.tail}`;
}

/**
 * The entity tag of the flight line a poll would receive now: the same tag while the same snapshot
 * serves it (records, club date and notices' effect unchanged). Everything but `generatedAt`,
 * the instant of the answer, is the same under one tag, so a poller holding it is answered
 * 304 Not Modified without a body.
 */
export function getFlightLineEtag(db: Db, club: Club, now: Date = new Date()): string {
  const snap = flightLineSnapshot(db, club, now);
  snap.etag ??= `"fl-${ETAG_PREFIX}-${++etagCounter}"`;
  return snap.etag;
}

/** One aircraft's entry, or undefined when it is not this club's (404). */
export function getAircraftStatusEntry(db: Db, club: Club, aircraftId: string, now: Date = new Date()): (FlightLineEntry & { today: string }) | undefined {
  const today = isoDateInTimeZone(now, club.timeZone);
  const records = loadAircraftRecords(db, club.id, aircraftId, now);
  if (records.aircraft.length === 0) return undefined;
  const [entry] = buildFlightLine(records, today, now.toISOString(), thresholds(club), club.timeZone);
  return entry ? { ...entry, today } : undefined;
}
