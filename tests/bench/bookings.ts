// Bookings benchmark: one club with the flight-line benchmark's 30 aircraft (and their records)
// and 100,000 existing bookings. Reports creating a booking — the whole path inside its one
// transaction: write lock, overlap check, every guard (status now and at the end, currency,
// arrears), insert with the database's overlap trigger — and the week view for 30 aircraft.
// Targets: create median under 10 ms; week view under 50 ms.

import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import * as React from "react";
import { createElement } from "react";
import { renderToString } from "react-dom/server";
import type { BenchResult, BenchTools } from "./run";

const BOOKINGS = 100_000;
const MEMBERS = 200;
const SLOT_MS = 4 * 3_600_000;

function percentile(samples: number[], p: number): number {
  const sorted = [...samples].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] ?? Number.NaN;
}

function localInput(ms: number, timeZone: string): string {
  return new Intl.DateTimeFormat("sv-SE", { timeZone, dateStyle: "short", timeStyle: "short" }).format(new Date(ms)).replace(" ", "T");
}

export async function run({ measure }: BenchTools): Promise<BenchResult[]> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "hangarline-bench-bookings-"));
  const file = path.join(dir, "bench.db");
  const { openDatabase } = await import("@/db/client");
  const { migrateDatabase } = await import("@/db/migrate");
  const { aircraft, clubs, memberships, users } = await import("@/db/schema");
  const { seedBench } = await import("./flight-line");
  const { defaultClubSettings } = await import("@/lib/validation/club-settings");
  const { defineAbilityFor } = await import("@/permissions");
  const { createBookingInTx } = await import("@/lib/actions/bookings/booking-core");
  const { createBookingSchema } = await import("@/lib/validation/bookings");
  const { listBookingsInRange, listSheetBookings, sheetBookingsQuery } = await import("@/db/queries/bookings");
  const { listAircraft } = await import("@/db/queries/fleet");
  const { getFlightLine } = await import("@/db/queries/fleet-status");
  const { viewRange } = await import("@/lib/actions/bookings/range");
  const { AircraftSchedule } = await import("@/components/bookings/aircraft-schedule");
  const { flyingWindow } = await import("@/lib/bookings/schedule");
  const { eq } = await import("drizzle-orm");

  (globalThis as { React?: typeof React }).React = React;
  const db = openDatabase(file);
  try {
    migrateDatabase(db);
    const settings = defaultClubSettings({ bookingGuards: { grounded: "warn", inspectionDue: "warn", notCheckedOut: "warn", notCurrent: "warn", flightReview: "warn", medicalExpired: "warn", inArrears: "warn" } });
    const [club] = db.insert(clubs).values({ slug: "bench-club", name: "Bench Club", timeZone: "America/Chicago", currency: "USD", unitSystem: "imperial", settings }).returning().all();
    const [owner] = db.insert(users).values({ email: "bench@hangarline.test", name: "Bench Pilot" }).returning().all();
    db.insert(memberships).values({ clubId: club!.id, userId: owner!.id, roles: ["member"], joinedOn: "2020-01-01" }).run();
    const t0 = performance.now();
    await seedBench(db, club!.id, owner!.id);
    const fleet = db.select({ id: aircraft.id }).from(aircraft).where(eq(aircraft.clubId, club!.id)).all();

    // 200 members; 100,000 two-hour bookings, one every four hours per aircraft, from about
    // fifteen months ago to three months ahead.
    const sqlite = db.$client;
    const memberIds: string[] = [];
    const insertUser = sqlite.prepare("INSERT INTO users (id, email, name, created_at, updated_at) VALUES (?, ?, ?, ?, ?)");
    const insertMember = sqlite.prepare("INSERT INTO memberships (id, club_id, user_id, roles, status, joined_on, created_at, updated_at) VALUES (?, ?, ?, '[\"member\"]', 'active', '2020-01-01', ?, ?)");
    const insertBooking = sqlite.prepare("INSERT INTO bookings (id, club_id, aircraft_id, user_id, starts_at, ends_at, status, accepted_warnings, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, ?, '[]', ?, ?)");
    const now = Date.now();
    const perAircraft = Math.ceil(BOOKINGS / fleet.length);
    const first = Math.floor((now - (perAircraft - 540) * SLOT_MS) / 3_600_000) * 3_600_000;
    sqlite.transaction(() => {
      for (let m = 0; m < MEMBERS; m++) {
        const id = `bench-member-${m}`;
        insertUser.run(id, `member${m}@bench.test`, `Member ${m}`, now, now);
        insertMember.run(`bench-ms-${m}`, club!.id, id, now, now);
        memberIds.push(id);
      }
      let n = 0;
      for (let k = 0; k < perAircraft && n < BOOKINGS; k++) {
        for (let a = 0; a < fleet.length && n < BOOKINGS; a++, n++) {
          const start = first + k * SLOT_MS;
          insertBooking.run(`bench-booking-${n}`, club!.id, fleet[a]!.id, memberIds[n % MEMBERS], start, start + 2 * 3_600_000, start + 2 * 3_600_000 < now ? "checked_in" : "reserved", now, now);
        }
      }
    })();
    sqlite.pragma("optimize");
    const count = (sqlite.prepare("SELECT count(*) n FROM bookings").get() as { n: number }).n;
    const note = `${count} bookings on ${fleet.length} aircraft, ${MEMBERS} members (seeded in ${((performance.now() - t0) / 1000).toFixed(1)} s)`;

    // The booking form's page shows the fleet's statuses first (the flight line), as a member
    // sees them before booking; the guards then read the club's kept records.
    getFlightLine(db, club!);

    // Each sample books a free hour in the gap after one future booking, on the next aircraft.
    const booker = memberIds[7]!;
    const ctx = { club: club!, user: { id: booker, email: "member7@bench.test", name: "Member 7", platformRole: null }, ability: defineAbilityFor({ userId: booker, roles: ["member"] }) };
    const nowSlot = Math.ceil((now - first) / SLOT_MS) + 2;
    let sample = 0;
    const created: string[] = [];
    const createResult = await measure("create a booking (lock, overlap, all guards, insert) with 100,000 bookings", () => {
      const i = sample++;
      const start = first + (nowSlot + i) * SLOT_MS + 2 * 3_600_000 + 15 * 60_000;
      const input = createBookingSchema.parse({ aircraftId: fleet[i % fleet.length]!.id, startsAt: localInput(start, club!.timeZone), endsAt: localInput(start + 3_600_000, club!.timeZone), acceptedGuards: ["grounded", "inspectionDue", "notCheckedOut", "notCurrent", "flightReview", "medicalExpired", "inArrears", "statusUnknown", "limitations"] });
      const made = db.transaction((tx) => createBookingInTx(tx, ctx as never, input));
      created.push(made.bookingId);
    }, { samples: 200, warmup: 5 });
    createResult.note = `${note}; p95 ${percentile(createResult.samplesMs, 95).toFixed(2)} ms; ${created.length} bookings made`;

    // The week route renders the sheet at once; the fleet's statuses stream in beside it in
    // their own Suspense boundary (the flight line's computation, measured separately below).
    const weekResult = await measure("week of the booking page for 30 aircraft (bookings query + server render by aircraft)", () => {
      const range = viewRange(club!, "week", undefined);
      const rows = listSheetBookings(db, club!.id, range.from, range.to);
      renderToString(
        createElement(AircraftSchedule, {
          days: range.days.map((d) => ({ date: d.date, day: { start: d.start, end: d.end }, window: flyingWindow(d.date, {}, club!.timeZone), note: "Flying day" })),
          aircraft: listAircraft(db, club!.id).map((a) => ({ id: a.id, registration: a.registration, name: `${a.make} ${a.model}`, status: "flyable" as const })),
          bookings: rows.map((b) => ({ id: b.id, aircraftId: b.aircraftId, start: b.startsAt.getTime(), end: b.endsAt.getTime(), status: b.status, who: b.memberName ?? b.memberEmail, mine: b.userId === booker })),
          blocks: [],
          nights: [],
          now: Date.now(),
          canBook: true,
          slug: "bench-club",
          timeZone: club!.timeZone,
        }),
      );
    }, { samples: 30 });
    const weekRows = listBookingsInRange(db, club!.id, viewRange(club!, "week", undefined).from, viewRange(club!, "week", undefined).to).length;
    weekResult.note = `${weekRows} bookings in the week; p95 ${percentile(weekResult.samplesMs, 95).toFixed(2)} ms`;
    const statusResult = await measure("week view's streamed status panel (flight line for 30 aircraft)", () => getFlightLine(db, club!), { samples: 20 });

    const listResult = await measure("week bookings query only (SQL)", () => {
      const range = viewRange(club!, "week", undefined);
      listSheetBookings(db, club!.id, range.from, range.to);
    }, { samples: 50 });
    const range = viewRange(club!, "week", undefined);
    const q = sheetBookingsQuery(db, club!.id, range.from, range.to).toSQL();
    const plan = sqlite.prepare(`EXPLAIN QUERY PLAN ${q.sql}`).all(...q.params.map((p) => (p instanceof Date ? p.getTime() : p))) as { detail: string }[];
    listResult.note = `query plan: ${plan.map((r) => r.detail).join("; ")}`;
    return [createResult, weekResult, statusResult, listResult];
  } finally {
    db.$client.close();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}
