// Invented demo data for bookings and the pilot tools: weight and balance figures for each
// seeded aircraft (made-up but plausible numbers for light piston aircraft, lb/in/US gal for the
// US clubs and kg/mm/litres for the metric club), a preflight checklist per aircraft, and a
// few bookings in the coming days. Nothing here describes a real aircraft type.

import { and, eq, inArray } from "drizzle-orm";
import type { Db } from "@/db/client";
import { aircraft, bookings, clubs, preflightTemplateItems, preflightTemplates, weightBalanceProfiles, type WbStation, type WbTank } from "@/db/schema";
import { addDays, isoDateInTimeZone } from "@/lib/dates";
import { localTimeToInstant } from "@/lib/fleet/time";
import type { EnvelopePoint } from "@/lib/performance";
import type { SeededFoundation } from "./foundation";

type Figures = {
  empty: [weight: number, arm: number];
  maxTakeoff: number;
  maxLanding: number | null;
  stations: [name: string, arm: number, max: number | null][];
  tanks: [name: string, arm: number, usableGal: number][];
  normal: EnvelopePoint[];
  utility: EnvelopePoint[] | null;
  burnGalPerHour: number;
  oil: [minQt: number, maxQt: number];
  sumps: string[];
  /** The tanks read at the preflight, with their usable capacity in US gallons. */
  preflightTanks: [name: string, usableGal: number][];
};

// Keyed by type group, in lb, in and US gallons.
const FIGURES: Record<string, Figures> = {
  "Larkspur L-2": {
    empty: [1112, 33.4], maxTakeoff: 1670, maxLanding: null,
    stations: [["Pilot and passenger", 39, null], ["Baggage", 64, 120]],
    tanks: [["Main tanks", 42, 24.5]],
    normal: [[31.0, 1000], [31.0, 1350], [32.6, 1670], [36.5, 1670], [36.5, 1000]], utility: null,
    burnGalPerHour: 6.0, oil: [4, 6], sumps: ["Left tank sump", "Right tank sump", "Gascolator"],
    preflightTanks: [["Left tank", 12], ["Right tank", 12]],
  },
  "Fernwhistle F160": {
    empty: [1486, 38.9], maxTakeoff: 2400, maxLanding: null,
    stations: [["Front seats", 37, null], ["Rear seats", 73, null], ["Baggage", 95, 120]],
    tanks: [["Wing tanks", 48, 40]],
    normal: [[35.0, 1500], [35.0, 1950], [39.5, 2400], [47.3, 2400], [47.3, 1500]],
    utility: [[35.0, 1500], [35.0, 1950], [35.5, 2000], [40.5, 2000], [40.5, 1500]],
    burnGalPerHour: 8.5, oil: [5, 8], sumps: ["Left wing sump", "Right wing sump", "Gascolator"],
    preflightTanks: [["Left wing tank", 20], ["Right wing tank", 20]],
  },
  "Brightwing BW-4": {
    empty: [1724, 39.6], maxTakeoff: 2650, maxLanding: 2550,
    stations: [["Front seats", 37, null], ["Rear seats", 72.5, null], ["Baggage", 95, 200]],
    tanks: [["Left wing tank", 48, 25], ["Right wing tank", 48, 25]],
    normal: [[35.5, 1600], [35.5, 2050], [40.0, 2650], [47.3, 2650], [47.3, 1600]], utility: null,
    burnGalPerHour: 10.5, oil: [6, 8], sumps: ["Left wing sump", "Right wing sump", "Fuel strainer"],
    preflightTanks: [["Left wing tank", 25], ["Right wing tank", 25]],
  },
};

const DOCUMENTS = ["Airworthiness certificate", "Registration certificate", "Flight manual with the weight and balance", "Club checklist and placards"];
const CHECKS = [
  "Cabin: master off, magnetos off, control lock removed",
  "Cabin: fuel quantity checked visually in each tank",
  "Cabin: navigation, strobe and landing lights work",
  "Left wing: aileron and hinges free and secure",
  "Left wing: fuel cap secure, vent clear",
  "Left wing: tire, brake and strut",
  "Nose: propeller free of nicks, spinner secure",
  "Nose: oil quantity and cap secure",
  "Nose: air intake clear, nose tire and strut",
  "Right wing: aileron and hinges free and secure",
  "Right wing: fuel cap secure, vent clear",
  "Right wing: tire, brake and strut",
  "Tail: elevator and rudder free, hinges secure",
  "Tail: antennas secure",
];

const r1 = (n: number) => Math.round(n * 10) / 10;
const LB_KG = 0.45359237;
const IN_MM = 25.4;
const GAL_L = 3.785411784;
const QT_L = GAL_L / 4;

function slugKey(name: string, i: number) {
  return `${name.toLowerCase().replace(/[^a-z0-9]+/g, "-")}-${i + 1}`;
}

function profileValues(f: Figures, metric: boolean) {
  const w = (lb: number) => (metric ? Math.round(lb * LB_KG) : lb);
  const a = (inch: number) => (metric ? Math.round(inch * IN_MM) : inch);
  const v = (gal: number) => (metric ? Math.round(gal * GAL_L) : gal);
  const stations: WbStation[] = f.stations.map(([name, arm, max], i) => ({ key: slugKey(name, i), name, arm: a(arm), maxWeight: max === null ? null : w(max) }));
  const tanks: WbTank[] = f.tanks.map(([name, arm, gal], i) => ({ key: slugKey(name, i), name, arm: a(arm), usableCapacity: v(gal) }));
  const env = (pts: EnvelopePoint[] | null): EnvelopePoint[] | null => (pts ? pts.map(([arm, lb]) => [a(arm), w(lb)] as EnvelopePoint) : null);
  return {
    unitSystem: metric ? ("metric" as const) : ("imperial" as const),
    emptyWeight: w(f.empty[0]), emptyArm: metric ? Math.round(f.empty[1] * IN_MM) : f.empty[1],
    maxTakeoffWeight: w(f.maxTakeoff), maxLandingWeight: f.maxLanding === null ? null : w(f.maxLanding),
    stations, tanks, fuelKind: "avgas" as const, burnPerHour: metric ? r1(f.burnGalPerHour * GAL_L) : f.burnGalPerHour,
    envelopeNormal: env(f.normal)!, envelopeUtility: env(f.utility),
    source: "Invented demo figures, not from any real aircraft",
  };
}

export function seedBookings(db: Db, foundation: SeededFoundation): void {
  const { clubIds, userIds } = foundation;
  const rows = db.select().from(clubs).where(inArray(clubs.id, Object.values(clubIds))).all();
  db.transaction((tx) => {
    for (const club of rows) {
      const metric = club.unitSystem === "metric";
      const fleet = tx.select().from(aircraft).where(eq(aircraft.clubId, club.id)).all();
      for (const plane of fleet) {
        const f = FIGURES[plane.typeGroup];
        if (!f) continue;
        tx.insert(weightBalanceProfiles).values({ clubId: club.id, aircraftId: plane.id, ...profileValues(f, metric) }).run();
        const [template] = tx
          .insert(preflightTemplates)
          .values({ clubId: club.id, aircraftId: plane.id, oilMinimum: metric ? r1(f.oil[0] * QT_L) : f.oil[0], oilMaximum: metric ? r1(f.oil[1] * QT_L) : f.oil[1], sumpPoints: f.sumps, fuelTanks: f.preflightTanks.map(([name, gal]) => ({ name, capacity: metric ? Math.round(gal * GAL_L) : gal })) })
          .returning({ id: preflightTemplates.id })
          .all();
        const items = [
          // Documents are checked in the cabin: one group fewer to tap on the ramp.
          ...DOCUMENTS.map((label) => ({ section: "Cabin", label, kind: "document" as const })),
          ...CHECKS.map((line) => ({ section: line.split(":")[0]!, label: line.slice(line.indexOf(":") + 1).trim(), kind: "check" as const })),
        ];
        tx.insert(preflightTemplateItems).values(items.map((item, position) => ({ ...item, position, clubId: club.id, templateId: template!.id }))).run();
      }
    }

    // A few bookings in the coming days, made as the demo members would make them.
    const plan: { club: string; registration: string; who: string; instructor?: string; inDays: number; from: string; to: string; purpose: string }[] = [
      { club: "reedwater", registration: "N0527L", who: "member@hangarline.test", inDays: 1, from: "09:00", to: "11:00", purpose: "Pattern work" },
      { club: "reedwater", registration: "N0556L", who: "student@hangarline.test", instructor: "instructor@hangarline.test", inDays: 2, from: "14:00", to: "16:00", purpose: "Dual: stalls and steep turns" },
      { club: "reedwater", registration: "N0549L", who: "pilot2@hangarline.test", inDays: 3, from: "08:30", to: "12:30", purpose: "Cross-country to the lake" },
      { club: "reedwater", registration: "N0534L", who: "twoclubs@hangarline.test", inDays: 4, from: "10:00", to: "13:00", purpose: "Sightseeing" },
      { club: "cottonwood", registration: "N0488C", who: "cottonwood.pilot@hangarline.test", inDays: 2, from: "07:30", to: "09:30", purpose: "Morning local flight" },
      { club: "silberau", registration: "D-0SLB", who: "silberau.pilot@hangarline.test", inDays: 3, from: "10:00", to: "12:00", purpose: "Platzrunden" },
    ];
    for (const p of plan) {
      const club = rows.find((c) => c.id === clubIds[p.club]);
      if (!club) continue;
      const plane = tx.select().from(aircraft).where(and(eq(aircraft.clubId, club.id), eq(aircraft.registration, p.registration))).get();
      const userId = userIds[p.who];
      if (!plane || !userId) continue;
      const day = addDays(isoDateInTimeZone(new Date(), club.timeZone), p.inDays);
      tx.insert(bookings)
        .values({
          clubId: club.id, aircraftId: plane.id, userId, instructorId: p.instructor ? userIds[p.instructor] ?? null : null,
          startsAt: localTimeToInstant(`${day}T${p.from}`, club.timeZone), endsAt: localTimeToInstant(`${day}T${p.to}`, club.timeZone),
          purpose: p.purpose, createdById: userId,
        })
        .run();
    }
  });
}
