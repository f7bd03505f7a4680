import "server-only";
import { and, eq, inArray, isNull, sql } from "drizzle-orm";
import type { Db } from "@/db/client";
import { aircraft, groundingNotices, inspectionItems, squawks, type Club } from "@/db/schema";
import { isoDateInTimeZone } from "@/lib/dates";
import { buildFlightLine, type FleetRecords } from "@/lib/fleet/flight-line";
import { clubSnapshot, deepFreeze } from "./club-snapshot";
import type { FleetCompletionRecord, FleetItemRecord, FlightLineEntry } from "@/lib/fleet/types";

// What the flight line needs and nothing more: the aircraft (current meters are kept on them),
// their items with the completions that govern them, open squawks and notices not lifted.
// Flights are never read.

const CHAIN_RULES: ReadonlySet<string> = new Set(["hours", "months-or-hours"]);

/**
 * The completions that decide each item, read through the (aircraft_id, item_id, done_on, hours)
 * index: for a calendar, days or fixed-date item only its latest one (the due date runs from
 * it); for an hours-based item its whole history, and that of the items it borrows from
 * (satisfiedBy), because the 100-hour's carried-forward excess (14 CFR 91.409(b)) is a chain
 * through every earlier due point. "Latest" is the rules' own order: the date, then the meter
 * reading (none before any), then the order recorded.
 */
function loadGoverningCompletions(db: Db, clubId: string, items: FleetItemRecord[], aircraftId?: string): FleetCompletionRecord[] {
  const byAircraft = new Map<string, FleetItemRecord[]>();
  for (const i of items) byAircraft.set(i.aircraftId, [...(byAircraft.get(i.aircraftId) ?? []), i]);
  const chain = new Set<string>();
  for (const list of byAircraft.values()) {
    for (const item of list) {
      if (!CHAIN_RULES.has(item.ruleKind)) continue;
      chain.add(item.id);
      const borrowed = new Set(item.satisfiedBy ?? []);
      for (const s of list) if (borrowed.has(s.key)) chain.add(s.id);
    }
  }
  const chainIds = JSON.stringify([...chain]);
  return db.all<FleetCompletionRecord>(sql`
    SELECT c.item_id AS itemId, c.done_on AS doneOn, c.hours AS hours, c.expires_on AS expiresOn
    FROM inspection_items i
    JOIN inspection_completions c ON c.rowid = (
      SELECT c2.rowid FROM inspection_completions c2 WHERE c2.aircraft_id = i.aircraft_id AND c2.item_id = i.id
      ORDER BY c2.done_on DESC, c2.hours DESC, c2.rowid DESC LIMIT 1)
    WHERE i.club_id = ${clubId} AND i.retired_at IS NULL ${aircraftId ? sql`AND i.aircraft_id = ${aircraftId}` : sql``}
      AND i.id NOT IN (SELECT value FROM json_each(${chainIds}))
    UNION ALL
    SELECT c.item_id, c.done_on, c.hours, c.expires_on
    FROM json_each(${chainIds}) j
    JOIN inspection_items i ON i.id = j.value AND i.club_id = ${clubId}
    JOIN inspection_completions c ON c.aircraft_id = i.aircraft_id AND c.item_id = i.id`);
}

export function loadFleetRecords(db: Db, clubId: string, aircraftId?: string): FleetRecords {
  const one = aircraftId ? [eq(aircraft.id, aircraftId)] : [];
  const fleet = db
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
    .where(and(eq(aircraft.clubId, clubId), isNull(aircraft.retiredAt), ...one))
    .orderBy(aircraft.registration)
    .all();
  if (fleet.length === 0) return { aircraft: [], items: [], completions: [], squawks: [], notices: [] };
  const ids = fleet.map((a) => a.id);

  const items = db
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
    .where(and(eq(inspectionItems.clubId, clubId), isNull(inspectionItems.retiredAt), aircraftId ? eq(inspectionItems.aircraftId, aircraftId) : undefined))
    .orderBy(inspectionItems.createdAt)
    .all();

  const completions = loadGoverningCompletions(db, clubId, items, aircraftId);

  const openSquawks = db
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
    .where(and(eq(squawks.clubId, clubId), eq(squawks.status, "open"), aircraftId ? eq(squawks.aircraftId, aircraftId) : inArray(squawks.aircraftId, ids)))
    .orderBy(squawks.createdAt)
    .all();

  const notices = db
    .select({ id: groundingNotices.id, aircraftId: groundingNotices.aircraftId, category: groundingNotices.category, reason: groundingNotices.reason, effectiveAt: groundingNotices.effectiveAt, liftedAt: groundingNotices.liftedAt })
    .from(groundingNotices)
    .where(and(eq(groundingNotices.clubId, clubId), isNull(groundingNotices.liftedAt), aircraftId ? eq(groundingNotices.aircraftId, aircraftId) : undefined))
    .orderBy(groundingNotices.effectiveAt)
    .all();

  return {
    aircraft: fleet,
    items,
    completions,
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
  const entries = buildFlightLine(loadFleetRecords(db, club.id), today, now.toISOString(), thresholds(club));
  return { today, generatedAt: now.toISOString(), timeZone: club.timeZone, entries };
}

type FlightLineSnapshot = { today: string; timeZone: string; entries: FlightLineEntry[]; json?: { head: string; tail: string } };

/**
 * A computed flight line holds while the records do not change (the club data version), on
 * the same club date, and until the next grounding notice not lifted takes effect (or back to
 * the last one that did, for a caller asking about an earlier instant).
 */
function flightLineSnapshot(db: Db, club: Club, now: Date): FlightLineSnapshot {
  const today = isoDateInTimeZone(now, club.timeZone);
  const soon = thresholds(club);
  const key = `${today}|${club.timeZone}|${soon.days}|${soon.hours}`;
  return clubSnapshot<FlightLineSnapshot>(db, "flight-line", club.id, key, now.getTime(), () => {
    const line = computeFlightLine(db, club, now);
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
    // The size of the kept objects is about a few times their JSON.
    const bytes = 4 * JSON.stringify(entries).length;
    return { value: { today, timeZone: club.timeZone, entries }, bytes, validFrom, validUntil };
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

/** One aircraft's entry, or undefined when it is not this club's (404). */
export function getAircraftStatusEntry(db: Db, club: Club, aircraftId: string, now: Date = new Date()): (FlightLineEntry & { today: string }) | undefined {
  const client = (db as Partial<Db>).$client;
  if (client && !client.inTransaction) {
    const snap = flightLineSnapshot(db, club, now);
    const entry = snap.entries.find((e) => e.aircraft.id === aircraftId);
    return entry ? { ...entry, today: snap.today } : undefined;
  }
  const records = loadFleetRecords(db, club.id, aircraftId);
  if (records.aircraft.length === 0) return undefined;
  const today = isoDateInTimeZone(now, club.timeZone);
  const [entry] = buildFlightLine(records, today, now.toISOString(), thresholds(club));
  return entry ? { ...entry, today } : undefined;
}
