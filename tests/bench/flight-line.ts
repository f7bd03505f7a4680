// Flight-line benchmark: one club with 30 aircraft, 5,000 flights and 200 squawks each (and
// the inspection history that much flying brings). Reports the median server time of the
// flight-line JSON handler and page render, and of the status rules for the whole fleet.
// Target: the JSON route under 50 ms median on the project machine.

import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import * as React from "react";
import { createElement } from "react";
import { renderToString } from "react-dom/server";
import type { BenchResult, BenchTools } from "./run";

const AIRCRAFT = 30;
const FLIGHTS = 5_000;
const SQUAWKS = 200;

type Db = import("@/db/client").Db;

/** Fills one club with the benchmark fleet; exported so a running server's database can be filled too. */
export function seedBench(db: Db, clubId: string, userId: string) {
  const sqlite = db.$client;
  const now = Date.now();
  let n = 0;
  const nextId = () => `bench-${(n++).toString(36)}`;
  const insertAircraft = sqlite.prepare("INSERT INTO aircraft (id, club_id, registration, make, model, type_group, category, class_rating, hourly_rate_minor, rate_meter, maintenance_meter, current_hobbs, current_tach, used_for_hire, used_for_instruction, ifr_equipped, used_for_ifr, created_at, updated_at) VALUES (?, ?, ?, 'Larkspur', 'L-2 Trainer', 'Larkspur L-2', 'Airplane', 'Single-engine land', 12800, 'hobbs', 'tach', ?, ?, 0, ?, ?, ?, ?, ?)");
  const insertItem = sqlite.prepare("INSERT INTO inspection_items (id, club_id, aircraft_id, key, name, origin, rule_kind, months, hours, days, overrun_hours, required, ifr_only, hire_or_instruction_only, satisfied_by, usage_limit_hours, usage_used_hours, source, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)");
  const insertCompletion = sqlite.prepare("INSERT INTO inspection_completions (id, club_id, aircraft_id, item_id, done_on, hours, expires_on, mechanic_name, mechanic_certificate, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, ?, 'Bench Mechanic', 'A&P 0000000', ?, ?)");
  const insertFlight = sqlite.prepare("INSERT INTO flights (id, club_id, aircraft_id, pilot_id, flown_on, hobbs_out, hobbs_in, tach_out, tach_in, day_landings, night_full_stop_landings, fuel_added, oil_added, fuel_unit, oil_unit, continuity, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, 2, 0, 10, 0, 'gal', 'qt', 'ok', ?, ?)");
  const insertSquawk = sqlite.prepare("INSERT INTO squawks (id, club_id, aircraft_id, reported_by_id, description, found_during, suspected_grounding, triage, limitation, placarded, status, created_at, updated_at) VALUES (?, ?, ?, ?, ?, 'preflight', 0, ?, ?, ?, ?, ?, ?)");
  const insertNotice = sqlite.prepare("INSERT INTO grounding_notices (id, club_id, aircraft_id, category, reason, effective_at, issued_by_id, lifted_at, created_at, updated_at) VALUES (?, ?, ?, 'maintenance', ?, ?, ?, ?, ?, ?)");
  return import("@/lib/fleet/default-items").then(({ defaultItemColumns }) => import("@/lib/dates").then(({ addDays, isoDateInTimeZone }) => {
    const today = isoDateInTimeZone(new Date(), "America/Chicago");
    sqlite.transaction(() => {
      for (let a = 0; a < AIRCRAFT; a++) {
        const aircraftId = nextId();
        const ifr = a % 3 === 0;
        const hobbsEnd = 1_000 + FLIGHTS * 1.2;
        insertAircraft.run(aircraftId, clubId, `N0${String(a).padStart(3, "0")}B`, hobbsEnd, hobbsEnd * 0.85, a % 2, ifr ? 1 : 0, ifr ? 1 : 0, now, now);
        const itemIds: Record<string, string> = {};
        for (const c of defaultItemColumns({ months: 4, hours: 50 })) {
          const id = nextId();
          itemIds[c.key] = id;
          insertItem.run(id, clubId, aircraftId, c.key, c.name, c.origin, c.ruleKind, c.months, c.hours, c.days, c.overrunHours, c.required ? 1 : 0, c.ifrOnly ? 1 : 0, c.hireOrInstructionOnly ? 1 : 0, c.satisfiedBy ? JSON.stringify(c.satisfiedBy) : null, c.usageLimitHours, c.usageUsedHours, c.source, now, now);
        }
        // Ten years of records: the history that 5,000 flights bring.
        const done = (key: string, daysAgo: number, hours: number | null, expires: string | null = null) => insertCompletion.run(nextId(), clubId, aircraftId, itemIds[key], addDays(today, -daysAgo), hours, expires, now, now);
        const tachEnd = hobbsEnd * 0.85;
        for (let y = 9; y >= 0; y--) done("annual", y * 365 + 40, tachEnd - y * 510 - 20);
        for (let h = 50; h >= 0; h--) done("100-hour", h * 72 + 10, tachEnd - h * 100 - 30);
        for (let o = 100; o >= 0; o--) done("oil-change", o * 36 + 5, tachEnd - o * 50 - 10);
        for (let y = 9; y >= 0; y--) done("elt", y * 365 + 40, null);
        for (let y = 4; y >= 0; y--) done("transponder", y * 730 + 100, null);
        for (let y = 3; y >= 0; y--) done("elt-battery", y * 1000 + 200, null, addDays(today, 900 - y * 1000));
        if (ifr) {
          for (let y = 4; y >= 0; y--) done("altimeter-static", y * 730 + 100, null);
          for (let d = 100; d >= 0; d--) done("vor-check", d * 28 + 3, null);
        }
        for (let f = 0; f < FLIGHTS; f++) {
          const out = 1_000 + f * 1.2;
          insertFlight.run(nextId(), clubId, aircraftId, userId, addDays(today, -Math.floor((FLIGHTS - f) / 1.5)), out, out + 1.2, out * 0.85, (out + 1.2) * 0.85, now, now);
        }
        for (let s = 0; s < SQUAWKS; s++) {
          const open = s >= SQUAWKS - 3;
          const triage = !open ? "grounding" : s === SQUAWKS - 1 ? (a % 5 === 0 ? "untriaged" : "note") : s === SQUAWKS - 2 ? "deferred" : "note";
          insertSquawk.run(nextId(), clubId, aircraftId, userId, `Bench squawk ${s}`, triage, triage === "deferred" ? "No night flight" : null, triage === "deferred" ? 1 : 0, open ? "open" : "closed", now - (SQUAWKS - s) * 86_400_000, now);
        }
        for (let k = 0; k < 5; k++) insertNotice.run(nextId(), clubId, aircraftId, `Bench notice ${k}`, now - (k + 2) * 30 * 86_400_000, userId, a === 0 && k === 0 ? null : now - (k + 1) * 30 * 86_400_000, now, now);
      }
    })();
  }));
}

export async function run({ measure }: BenchTools): Promise<BenchResult[]> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "hangarline-bench-"));
  const file = path.join(dir, "bench.db");
  const { openDatabase } = await import("@/db/client");
  const { migrateDatabase } = await import("@/db/migrate");
  const { clubs, memberships, users } = await import("@/db/schema");
  const { getActiveMembership, getClubBySlug } = await import("@/db/queries/clubs");
  const { getFlightLine, loadFleetRecords } = await import("@/db/queries/fleet-status");
  const { buildFlightLine } = await import("@/lib/fleet/flight-line");
  const { defaultClubSettings } = await import("@/lib/validation/club-settings");
  const { defineAbilityFor } = await import("@/permissions");
  const { NextResponse } = await import("next/server");
  const { QueryClient, QueryClientProvider } = await import("@tanstack/react-query");
  const { FlightLineBoard } = await import("@/components/fleet/flight-line-board");
  const { SafetyCaution } = await import("@/components/ui/safety-caution");

  // tsx compiles the components' JSX to React.createElement (the classic runtime).
  (globalThis as { React?: typeof React }).React = React;
  const db = openDatabase(file);
  try {
    migrateDatabase(db);
    const [club] = db.insert(clubs).values({ slug: "bench-club", name: "Bench Club", timeZone: "America/Chicago", currency: "USD", unitSystem: "imperial", settings: defaultClubSettings() }).returning().all();
    const [user] = db.insert(users).values({ email: "bench@hangarline.test", name: "Bench Pilot" }).returning().all();
    db.insert(memberships).values({ clubId: club!.id, userId: user!.id, roles: ["member"], joinedOn: "2020-01-01" }).run();
    const t0 = performance.now();
    await seedBench(db, club!.id, user!.id);
    const seedMs = performance.now() - t0;
    db.$client.pragma("optimize");

    const counts = db.$client.prepare("SELECT (SELECT count(*) FROM flights) f, (SELECT count(*) FROM squawks) s, (SELECT count(*) FROM inspection_completions) c").get() as { f: number; s: number; c: number };
    const note = `${AIRCRAFT} aircraft, ${counts.f} flights, ${counts.s} squawks, ${counts.c} completions (seeded in ${(seedMs / 1000).toFixed(1)} s)`;
    const statuses = getFlightLine(db, club!).entries.map((e) => e.status);
    const records = loadFleetRecords(db, club!.id);
    const now = new Date();

    return [
      await measure("flight-line JSON route handler (club→membership→ability→data→JSON)", async () => {
        const c = getClubBySlug(db, "bench-club")!;
        const m = getActiveMembership(db, c.id, user!.id)!;
        defineAbilityFor({ userId: user!.id, roles: m.roles }).can("read", "Aircraft");
        await NextResponse.json(getFlightLine(db, c)).text();
      }, { samples: 50, note: `${note}; statuses ${JSON.stringify(countBy(statuses))}; session lookup (Auth.js) not included` }),
      await measure("flight-line page (data + server render of the board)", () => {
        const initial = getFlightLine(db, club!);
        const client = new QueryClient();
        renderToString(createElement(QueryClientProvider, { client }, createElement(SafetyCaution, { compact: true }), createElement(FlightLineBoard, { slug: "bench-club", initial })));
      }, { samples: 30, note: "React server render of the client board, without the shell layout" }),
      await measure("loading the flight-line records (SQL only)", () => loadFleetRecords(db, club!.id), { samples: 50 }),
      await measure("aircraftStatus + due lists for the whole fleet (records in memory)", () => buildFlightLine(records, "2026-05-15", now.toISOString(), { days: 30, hours: 10 }), { samples: 50 }),
    ];
  } finally {
    db.$client.close();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

function countBy(values: string[]): Record<string, number> {
  return values.reduce<Record<string, number>>((acc, v) => ({ ...acc, [v]: (acc[v] ?? 0) + 1 }), {});
}
