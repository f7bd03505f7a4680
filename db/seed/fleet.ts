// The invented demo fleet. Every name, registration and airfield is made up: "N0…" marks are
// never issued by the US registry, and "D-0…" cannot be a German mark (a letter follows "D-").
// Dates are computed from the day the seed runs, so the demo stays true: the annual that is due
// this month is due this month whenever the seed runs.

import { eq, inArray } from "drizzle-orm";
import type { Db } from "@/db/client";
import { aircraft, clubs, flights, inspectionCompletions, inspectionItems, squawkEvents, squawks, type Club } from "@/db/schema";
import { calendarDue, roundHours } from "@/lib/airworthiness";
import { addDays, daysBetween, formatIsoDate, isoDateInTimeZone, lastDayOfMonth, parseIsoDate, shiftMonth } from "@/lib/dates";
import { defaultItemColumns } from "@/lib/fleet/default-items";
import { DEMO_PEOPLE } from "./scenario";
import { flightHistory } from "./fleet-history";
import type { SeededFoundation } from "./foundation";

type Plane = {
  registration: string;
  make: string;
  model: string;
  typeGroup: string;
  homeField: string;
  rate: number;
  hobbs: number;
  tach: number;
  instruction?: boolean;
  ifr?: boolean;
  /** Conventional (tailwheel) gear: 14 CFR 61.57(a)(1)(ii). All are airplanes, single-engine land. */
  tailwheel?: boolean;
  /** Months since the annual; 12 → due at the end of this month. */
  annualMonthsAgo: number;
  /** Hours left on the 100-hour (instruction aircraft) and the oil change. */
  hundredLeft?: number;
  oilLeft: number;
};

const FLEET: Record<string, Plane[]> = {
  cottonwood: [
    { registration: "N0471C", make: "Larkspur", model: "L-2 Trainer", typeGroup: "Larkspur L-2", homeField: "Cottonwood Mesa (MESAWIND)", rate: 128, hobbs: 4120.4, tach: 3488.1, instruction: true, annualMonthsAgo: 5, hundredLeft: 46.3, oilLeft: 31.2 },
    { registration: "N0488C", make: "Larkspur", model: "L-2 Trainer", typeGroup: "Larkspur L-2", homeField: "Cottonwood Mesa (MESAWIND)", rate: 128, hobbs: 3377.9, tach: 2871.6, instruction: true, annualMonthsAgo: 8, hundredLeft: 71.5, oilLeft: 7.4 },
  ],
  reedwater: [
    { registration: "N0512L", make: "Fernwhistle", model: "F160", typeGroup: "Fernwhistle F160", homeField: "Reedwater Field (REEDWATER)", rate: 152, hobbs: 5230.7, tach: 4410.2, instruction: true, annualMonthsAgo: 4, hundredLeft: 38.9, oilLeft: 22.5 },
    { registration: "N0527L", make: "Fernwhistle", model: "F160", typeGroup: "Fernwhistle F160", homeField: "Reedwater Field (REEDWATER)", rate: 152, hobbs: 4871.2, tach: 4102.8, instruction: true, annualMonthsAgo: 7, hundredLeft: 63.0, oilLeft: 40.1 },
    { registration: "N0534L", tailwheel: true, make: "Brightwing", model: "BW-4 Tourer", typeGroup: "Brightwing BW-4", homeField: "Reedwater Field (REEDWATER)", rate: 189, hobbs: 2954.3, tach: 2511.0, annualMonthsAgo: 12, oilLeft: 28.0 },
    { registration: "N0549L", tailwheel: true, make: "Brightwing", model: "BW-4 Tourer IFR", typeGroup: "Brightwing BW-4", homeField: "Reedwater Field (REEDWATER)", rate: 198, hobbs: 3318.6, tach: 2820.9, ifr: true, annualMonthsAgo: 2, oilLeft: 35.6 },
    { registration: "N0556L", make: "Larkspur", model: "L-2 Trainer", typeGroup: "Larkspur L-2", homeField: "Reedwater Field (REEDWATER)", rate: 126, hobbs: 6012.5, tach: 5110.6, instruction: true, annualMonthsAgo: 9, hundredLeft: 82.4, oilLeft: 44.0 },
  ],
  silberau: [
    { registration: "D-0SLA", make: "Larkspur", model: "L-2 Trainer", typeGroup: "Larkspur L-2", homeField: "Flugplatz Silberau (SILBERAU)", rate: 139, hobbs: 2210.8, tach: 1879.2, instruction: true, annualMonthsAgo: 6, hundredLeft: 55.0, oilLeft: 26.7 },
    { registration: "D-0SLB", tailwheel: true, make: "Brightwing", model: "BW-4 Tourer", typeGroup: "Brightwing BW-4", homeField: "Flugplatz Silberau (SILBERAU)", rate: 176, hobbs: 1785.3, tach: 1517.5, annualMonthsAgo: 3, oilLeft: 33.3 },
  ],
};

const MECHANICS: Record<string, { name: string; certificate: string }[]> = {
  cottonwood: [{ name: "Ardith Sorensby", certificate: "A&P 0004417 IA" }],
  reedwater: [{ name: "Hollis Fairbank", certificate: "A&P 0003902 IA" }, { name: "Petra Voskuijlen", certificate: "A&P 0005168" }],
  silberau: [{ name: "Jannik Oberwald", certificate: "Part-66 X0-66-0000-0417" }],
};

/** The same day of the month `n` months before `today`, clipped to that month's length. */
function monthsBefore(today: string, n: number, day = 12): string {
  const { year, month } = parseIsoDate(today);
  const t = shiftMonth(year, month, -n);
  return formatIsoDate(t.year, t.month, Math.min(day, lastDayOfMonth(t.year, t.month)));
}

function clubMembers(key: string, userIds: Record<string, string>): string[] {
  return DEMO_PEOPLE.filter((p) => p.clubs[key]?.includes("member")).map((p) => userIds[p.email]!);
}

type History = ReturnType<typeof flightHistory>;
const TACH_PER_DAY = 0.55; // before the logged history: the fleet's average use, invented

/** Tach reading on a date, from the flight history (or extrapolated before it). */
function tachOn(history: History, date: string): number {
  const first = history[0]!;
  // Meters read to tenths.
  if (date < first.flownOn) return Math.round((first.tachOut - daysBetween(date, first.flownOn) * TACH_PER_DAY) * 10) / 10;
  const flight = history.find((f) => f.flownOn >= date) ?? history.at(-1)!;
  return flight.tachOut;
}

/** Date on which the tach read `hours`, from the history (or extrapolated before it). */
function dateAtTach(history: History, hours: number): string {
  const first = history[0]!;
  if (hours < first.tachOut) return addDays(first.flownOn, -Math.ceil((first.tachOut - hours) / TACH_PER_DAY));
  return (history.find((f) => f.tachIn >= hours) ?? history.at(-1)!).flownOn;
}

function completionsFor(p: Plane, key: string, today: string, history: History): { doneOn: string; hours: number | null; expiresOn?: string }[] {
  const dated = (doneOn: string) => ({ doneOn, hours: tachOn(history, doneOn) });
  const counted = (hoursAgo: number) => {
    const hours = roundHours(p.tach - hoursAgo);
    return { doneOn: dateAtTach(history, hours), hours };
  };
  const annualOn = monthsBefore(today, p.annualMonthsAgo);
  switch (key) {
    case "annual":
      return [dated(monthsBefore(today, p.annualMonthsAgo + 12)), dated(annualOn)];
    case "100-hour":
      return p.hundredLeft === undefined ? [] : [counted(100 - p.hundredLeft)];
    case "elt":
      return [{ doneOn: annualOn, hours: null }];
    case "elt-battery":
      return [{ doneOn: monthsBefore(today, 14, 3), hours: null, expiresOn: calendarDue(monthsBefore(today, 14, 3), 36) }];
    case "transponder":
      return [{ doneOn: monthsBefore(today, 10, 20), hours: null }];
    case "altimeter-static":
      return p.ifr ? [{ doneOn: monthsBefore(today, 10, 20), hours: null }] : [];
    case "vor-check":
      return p.ifr ? [{ doneOn: addDays(today, -9), hours: null }] : [];
    case "oil-change":
      return [counted(50 - p.oilLeft)];
    default:
      return [];
  }
}

/** Every demo aircraft counts its inspections by the tach, and every completion says so. */
const SEED_MAINTENANCE_METER = "tach" as const;

function seedPlane(tx: Parameters<Parameters<Db["transaction"]>[0]>[0], club: Club, key: string, p: Plane, index: number, members: string[], mechanicUser: string | undefined) {
  const today = isoDateInTimeZone(new Date(), club.timeZone);
  const [row] = tx
    .insert(aircraft)
    .values({
      clubId: club.id, registration: p.registration, make: p.make, model: p.model, typeGroup: p.typeGroup, homeField: p.homeField,
      serialNumber: `SN-0${index + 1}${p.registration.slice(-3)}`, year: 1998 + index * 3, hourlyRateMinor: p.rate * 100,
      maintenanceMeter: SEED_MAINTENANCE_METER, currentHobbs: p.hobbs, currentTach: p.tach, usedForInstruction: Boolean(p.instruction), ifrEquipped: Boolean(p.ifr), usedForIfr: Boolean(p.ifr),
      category: "Airplane", classRating: "Single-engine land", tailwheel: Boolean(p.tailwheel),
      engineTboHours: 2000, engineTimeSinceOverhaul: roundHours(600 + index * 211.4),
    })
    .returning({ id: aircraft.id })
    .all();
  const aircraftId = row!.id;
  const cols = defaultItemColumns({ months: club.settings.oilChangeMonths, hours: club.settings.oilChangeHours });
  const items = tx.insert(inspectionItems).values(cols.map((c) => ({ ...c, clubId: club.id, aircraftId }))).returning({ id: inspectionItems.id, key: inspectionItems.key }).all();
  const mechanics = MECHANICS[key]!;
  const metric = club.unitSystem === "metric";
  const history = flightHistory({ count: 40, days: 70, today, hobbs: p.hobbs, tach: p.tach, pilots: members.length, seed: index * 97 + p.hobbs, metric });
  const done = items.flatMap((item, i) =>
    completionsFor(p, item.key, today, history).map((c) => ({
      clubId: club.id, aircraftId, itemId: item.id, doneOn: c.doneOn, hours: c.hours, meter: SEED_MAINTENANCE_METER, expiresOn: c.expiresOn ?? null,
      mechanicName: mechanics[i % mechanics.length]!.name, mechanicCertificate: mechanics[i % mechanics.length]!.certificate,
      notes: item.key === "annual" ? "Found airworthy. Logbook entry signed." : null, recordedById: mechanicUser ?? null,
    })),
  );
  if (done.length) tx.insert(inspectionCompletions).values(done).run();

  tx.insert(flights)
    .values(history.map(({ pilotIndex, ...f }) => ({ ...f, clubId: club.id, aircraftId, pilotId: members[pilotIndex]!, fuelUnit: metric ? ("l" as const) : ("gal" as const), oilUnit: metric ? ("l" as const) : ("qt" as const), recordedById: members[pilotIndex]! })))
    .run();
  return aircraftId;
}

function addSquawk(
  tx: Parameters<Parameters<Db["transaction"]>[0]>[0],
  s: { clubId: string; aircraftId: string; reporter: string; triager?: string; description: string; foundDuring: "preflight" | "flight" | "postflight"; triage?: "grounding" | "deferred" | "note"; limitation?: string; determinedBy?: string; closed?: { by: string; notes: string; mechanic: string; certificate: string; on: string }; daysAgo: number },
) {
  const at = new Date(Date.now() - s.daysAgo * 86_400_000);
  const [row] = tx
    .insert(squawks)
    .values({
      clubId: s.clubId, aircraftId: s.aircraftId, reportedById: s.reporter, description: s.description, foundDuring: s.foundDuring,
      triage: s.triage ?? "untriaged", limitation: s.limitation ?? null, placarded: s.triage === "deferred", deferralDeterminedBy: s.determinedBy ?? null,
      status: s.closed ? "closed" : "open", repairNotes: s.closed?.notes ?? null, rtsMechanicName: s.closed?.mechanic ?? null, rtsCertificate: s.closed?.certificate ?? null,
      rtsOn: s.closed?.on ?? null, closedAt: s.closed ? new Date(at.getTime() + 2 * 86_400_000) : null, closedById: s.closed?.by ?? null, createdAt: at, updatedAt: at,
    })
    .returning({ id: squawks.id })
    .all();
  const events: (typeof squawkEvents.$inferInsert)[] = [{ clubId: s.clubId, squawkId: row!.id, kind: "reported", toTriage: "untriaged", actorId: s.reporter, createdAt: at, updatedAt: at }];
  const triagedAt = new Date(at.getTime() + 3 * 3_600_000);
  if (s.triage) events.push({ clubId: s.clubId, squawkId: row!.id, kind: "triaged", fromTriage: "untriaged", toTriage: s.triage, actorId: s.triager ?? null, note: s.limitation ? `Limitation: ${s.limitation}. Determined by ${s.determinedBy}; placarded inoperative.` : null, createdAt: triagedAt, updatedAt: triagedAt });
  if (s.closed) {
    const closedAt = new Date(at.getTime() + 2 * 86_400_000);
    events.push({ clubId: s.clubId, squawkId: row!.id, kind: "closed", fromTriage: s.triage ?? "untriaged", toTriage: s.triage ?? "untriaged", actorId: s.closed.by, note: `${s.closed.notes} Returned to service by ${s.closed.mechanic}, certificate ${s.closed.certificate}, on ${s.closed.on}.`, createdAt: closedAt, updatedAt: closedAt });
  }
  tx.insert(squawkEvents).values(events).run();
}

export function seedFleet(db: Db, foundation: SeededFoundation): void {
  const { clubIds, userIds } = foundation;
  const rows = db.select().from(clubs).where(inArray(clubs.id, Object.values(clubIds))).all();
  db.transaction((tx) => {
    const ids: Record<string, string> = {};
    for (const [key, planes] of Object.entries(FLEET)) {
      const club = rows.find((c) => c.id === clubIds[key]);
      if (!club) continue;
      const members = clubMembers(key, userIds);
      const mechanicUser = key === "reedwater" ? userIds["mechanic@hangarline.test"] : undefined;
      planes.forEach((p, i) => (ids[p.registration] = seedPlane(tx, club, key, p, i, members, mechanicUser)));
    }
    const lake = clubIds.reedwater!;
    const member = userIds["member@hangarline.test"]!;
    const maint = userIds["maintenance@hangarline.test"]!;
    const today = isoDateInTimeZone(new Date(), rows.find((c) => c.id === lake)!.timeZone);
    addSquawk(tx, { clubId: lake, aircraftId: ids.N0512L!, reporter: member, triager: maint, description: "Right brake fades and the pedal sinks; fluid on the right wheel fairing", foundDuring: "postflight", triage: "grounding", daysAgo: 2 });
    addSquawk(tx, { clubId: lake, aircraftId: ids.N0527L!, reporter: userIds["student@hangarline.test"]!, triager: maint, description: "Left landing light inoperative", foundDuring: "preflight", triage: "deferred", limitation: "No night flight until the left landing light is repaired", determinedBy: "Hollis Fairbank, A&P 0003902 IA", daysAgo: 6 });
    addSquawk(tx, { clubId: lake, aircraftId: ids.N0549L!, reporter: userIds["instructor@hangarline.test"]!, triager: maint, description: "Intercom crackles on the right headset jack", foundDuring: "flight", triage: "note", daysAgo: 9 });
    addSquawk(tx, { clubId: lake, aircraftId: ids.N0556L!, reporter: userIds["pilot2@hangarline.test"]!, triager: maint, description: "Nose strut low after landing", foundDuring: "postflight", triage: "grounding", daysAgo: 20, closed: { by: maint, notes: "Strut serviced with nitrogen and fluid to the placard height.", mechanic: "Petra Voskuijlen", certificate: "A&P 0005168", on: addDays(today, -18) } });
    addSquawk(tx, { clubId: clubIds.cottonwood!, aircraftId: ids.N0471C!, reporter: userIds["cottonwood.pilot@hangarline.test"]!, triager: userIds["cottonwood.maint@hangarline.test"], description: "Fuel cap gasket worn on the left tank", foundDuring: "preflight", triage: "note", daysAgo: 4 });

    // One late-entered flight whose Hobbs out does not continue from the flight before it: the
    // flag is stored for maintenance, as the flight log does it.
    const flagged = tx.select().from(flights).where(eq(flights.aircraftId, ids.N0549L!)).orderBy(flights.hobbsOut).all().at(-4)!;
    tx.update(flights).set({ hobbsOut: roundHours(flagged.hobbsOut + 0.3), continuity: "gap", continuityText: `Hobbs out ${(flagged.hobbsOut + 0.3).toFixed(1)} is 0.3 h after the previous Hobbs in ${flagged.hobbsOut.toFixed(1)}: 0.3 h not logged` }).where(eq(flights.id, flagged.id)).run();
  });
}
