// The invented safety scenario: bulletins (one revised, one with a deadline, one draft), a
// named and an anonymous safety report, medicals and documents with expiries (one ending this
// month, some already lapsed), outside flights and checkouts. Every name and place is made up.
// Dates are computed from the day the seed runs, so "ends soon" stays true whenever it runs.

import { and, eq, inArray } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import {
  aircraft, bulletinAcknowledgements, bulletins, checkouts, clubs, medicalCertificates, memberDocuments, memberPrivateRecords,
  outsideFlightEntries, safetyReportEvents, safetyReports, type Club,
} from "@/db/schema";
import { newId } from "@/db/schema/columns";
import { flightReviewDue, medicalExpiry } from "@/lib/currency";
import { addDays, formatIsoDate, isoDateInTimeZone, parseIsoDate, shiftMonth } from "@/lib/dates";
import { startOfClubDay } from "@/lib/safety/report-digest";
import type { SeededFoundation } from "./foundation";

const DAY = 86_400_000;
const ago = (days: number) => new Date(Date.now() - days * DAY);

/** Day `day` of the month `months` months before `today` (clamped to 28 so it always exists). */
function monthsBefore(today: string, months: number, day: number): string {
  const { year, month } = parseIsoDate(today);
  const t = shiftMonth(year, month, -months);
  return formatIsoDate(t.year, t.month, Math.min(day, 28));
}

type Ids = Record<string, string>;

function insertBulletin(tx: Tx, b: Omit<typeof bulletins.$inferInsert, "seriesId"> & { id: string; seriesId?: string }) {
  tx.insert(bulletins).values({ ...b, seriesId: b.seriesId ?? b.id }).run();
}

function acknowledge(tx: Tx, clubId: string, bulletinId: string, userIds: string[], daysAgo: number) {
  if (userIds.length === 0) return;
  tx.insert(bulletinAcknowledgements).values(userIds.map((userId, i) => ({ clubId, bulletinId, userId, acknowledgedAt: ago(daysAgo - i * 0.1) }))).run();
}

function seedReedwaterBulletins(tx: Tx, clubId: string, u: Ids, today: string) {
  const safety = u["safety@hangarline.test"]!;
  const v1 = newId();
  const v2 = newId();
  insertBulletin(tx, {
    id: v1, clubId, version: 1, status: "published", title: "Brake check on the Fernwhistles", urgency: "priority", audience: "type_group", audienceTypeGroup: "Fernwhistle F160",
    bodyMarkdown: "Before taxi, press each brake pedal firmly and hold it for five seconds. A pedal that sinks means **no flight**: report a squawk.",
    createdById: safety, publishedById: safety, publishedAt: ago(12), supersededAt: ago(3), supersededById: v2, createdAt: ago(12), updatedAt: ago(3),
  });
  insertBulletin(tx, {
    id: v2, seriesId: v1, supersedesId: v1, clubId, version: 2, status: "published", title: "Brake check on the Fernwhistles (revised)", urgency: "priority", audience: "type_group", audienceTypeGroup: "Fernwhistle F160",
    bodyMarkdown: [
      "A Fernwhistle was grounded this week with a brake that faded on the rollout. Until maintenance has looked at the whole type:",
      "- Before taxi, press each brake pedal firmly and hold it for **five seconds**.",
      "- Look at each wheel fairing for fluid during the walk-around.",
      "- A pedal that sinks, or any fluid, means *no flight*: report a squawk and tell the safety officer.",
      "This replaces version 1, which did not mention the fairings.",
    ].join("\n\n"),
    acknowledgeBy: addDays(today, 10), createdById: safety, publishedById: safety, publishedAt: ago(3), createdAt: ago(3), updatedAt: ago(3),
  });
  acknowledge(tx, clubId, v1, [u["pilot2@hangarline.test"]!, u["safety@hangarline.test"]!], 11);
  acknowledge(tx, clubId, v2, [u["safety@hangarline.test"]!], 2);

  const winter = newId();
  insertBulletin(tx, {
    id: winter, clubId, version: 1, status: "published", title: "Carburettor icing: a refresher", urgency: "routine", audience: "everyone",
    bodyMarkdown: "Cool, damp mornings are carburettor-ice weather even well above freezing.\n\n1. Use carburettor heat as the aircraft's checklist says.\n2. A rough engine and falling RPM: full heat, and expect it to run rougher for a moment before it clears.\n\nQuestions? Ask any instructor.",
    createdById: safety, publishedById: safety, publishedAt: ago(20), createdAt: ago(21), updatedAt: ago(20),
  });
  acknowledge(tx, clubId, winter, ["instructor@hangarline.test", "admin@hangarline.test", "treasurer@hangarline.test", "maintenance@hangarline.test", "pilot2@hangarline.test"].map((e) => u[e]!), 18);

  insertBulletin(tx, {
    id: newId(), clubId, version: 1, status: "draft", title: "Runway works at Reedwater Field (REEDWATER)", urgency: "urgent", audience: "everyone",
    bodyMarkdown: "The west end of the runway closes for resurfacing. Dates and the displaced threshold to follow.", createdById: safety, createdAt: ago(1), updatedAt: ago(1),
  });
}

function seedReedwaterReports(tx: Tx, clubId: string, u: Ids, today: string, plane: string | undefined, timeZone: string) {
  const named = newId();
  tx.insert(safetyReports).values({
    id: named, clubId, reporterId: u["member@hangarline.test"]!, anonymous: false, occurredOn: addDays(today, -6), occurredTime: "16:40",
    location: "Reedwater Field (REEDWATER), taxiway B by the fuel pit", aircraftId: plane ?? null,
    whatHappened: "Taxiing back after landing I met a fuel truck crossing taxiway B without stopping. I braked hard and we stopped about thirty feet apart. The truck driver had not heard the radio call.",
    contributingFactors: ["communication", "procedures"], factorsNote: "The fuel pit has no hold line painted on the truck's side.", status: "reviewing", createdAt: ago(6), updatedAt: ago(5),
  }).run();
  tx.insert(safetyReportEvents).values({ clubId, reportId: named, actorId: u["safety@hangarline.test"]!, kind: "status", fromStatus: "received", toStatus: "reviewing", note: "Talked to the fuel supplier; asked the field owner about a hold line.", createdAt: ago(5), updatedAt: ago(5) }).run();
  // Anonymous: no reporter column value at all, and the instant is the start of the club day it arrived on.
  const day = startOfClubDay(addDays(today, -2), timeZone);
  tx.insert(safetyReports).values({
    clubId, anonymous: true, occurredOn: addDays(today, -2), location: "Reedwater Field (REEDWATER), tie-down row C",
    whatHappened: "The fuel sample from the left sump showed water twice before it ran clear. The previous pilot had logged no fuel. I kept draining until it was clean and flew, but I think the cap seal may let rain in.",
    contributingFactors: ["aircraft_equipment", "weather"], status: "received", createdAt: day, updatedAt: day,
  }).run();
}

// The demo's records were entered by the members and verified by the safety officer against
// the certificate or logbook (verifiedBy); one outside flight is left as the member's claim.
function medical(tx: Tx, clubId: string, userId: string, m: { cls: 1 | 2 | 3; exam: string; birth: string; limitations?: string; verifiedBy: string }) {
  tx.insert(memberPrivateRecords).values({ clubId, userId, birthDate: m.birth }).run();
  tx.insert(medicalCertificates).values({
    clubId, userId, kind: "faa_class", medicalClass: m.cls, examDate: m.exam, limitations: m.limitations ?? null, recordedById: userId, verifiedById: m.verifiedBy, verifiedAt: ago(2),
    expiresOn: medicalExpiry({ medicalClass: m.cls, examDate: m.exam, birthDate: m.birth }),
  }).run();
}

function doc(tx: Tx, clubId: string, userId: string, d: { kind: (typeof memberDocuments.$inferInsert)["kind"]; issuedOn: string; expiresOn?: string | null; reference?: string; details?: string; verifiedBy: string }) {
  const expiresOn = d.kind === "flight_review" ? flightReviewDue(d.issuedOn) : (d.expiresOn ?? null);
  tx.insert(memberDocuments).values({ clubId, userId, kind: d.kind, issuedOn: d.issuedOn, expiresOn, reference: d.reference ?? null, details: d.details ?? null, recordedById: userId, verifiedById: d.verifiedBy, verifiedAt: ago(2) }).run();
}

function seedReedwaterPeople(tx: Tx, clubId: string, u: Ids, today: string) {
  const member = u["member@hangarline.test"]!;
  const instructor = u["instructor@hangarline.test"]!;
  const officer = u["safety@hangarline.test"]!;
  // Under 40 on the exam date: 60 calendar months (14 CFR 61.23(d)).
  medical(tx, clubId, member, { cls: 3, exam: monthsBefore(today, 30, 12), birth: "1991-08-17", verifiedBy: officer });
  // 40 or older, exam 24 months back: runs out at the end of this month — "ends soon".
  medical(tx, clubId, instructor, { cls: 2, exam: monthsBefore(today, 24, 9), birth: "1972-04-03", limitations: "Must wear corrective lenses", verifiedBy: officer });
  // 40 or older, exam 26 months back: lapsed two months ago.
  medical(tx, clubId, u["pilot2@hangarline.test"]!, { cls: 3, exam: monthsBefore(today, 26, 15), birth: "1966-11-21", verifiedBy: officer });
  medical(tx, clubId, u["safety@hangarline.test"]!, { cls: 3, exam: monthsBefore(today, 11, 4), birth: "1979-02-28", verifiedBy: instructor });
  medical(tx, clubId, u["student@hangarline.test"]!, { cls: 3, exam: monthsBefore(today, 7, 20), birth: "2002-06-30", verifiedBy: officer });

  doc(tx, clubId, member, { kind: "pilot_certificate", issuedOn: "2021-05-14", reference: "PP-0041187", details: "Private pilot, airplane single-engine land", verifiedBy: officer });
  doc(tx, clubId, member, { kind: "flight_review", issuedOn: monthsBefore(today, 13, 8), details: "Imani Ostrowski", verifiedBy: officer });
  doc(tx, clubId, member, { kind: "renters_insurance", issuedOn: addDays(today, -345), expiresOn: addDays(today, 20), reference: "RI-88-20419", details: "Harbourlight Mutual (invented), 100,000 liability", verifiedBy: officer });
  doc(tx, clubId, member, { kind: "club_agreement", issuedOn: "2024-03-01", details: "Signed at joining", verifiedBy: officer });
  doc(tx, clubId, instructor, { kind: "flight_review", issuedOn: monthsBefore(today, 4, 2), details: "Designated examiner (invented)", verifiedBy: officer });
  // 25 months ago: the review ran out at the end of last month (14 CFR 61.56(c)).
  doc(tx, clubId, u["pilot2@hangarline.test"]!, { kind: "flight_review", issuedOn: monthsBefore(today, 25, 19), details: "Imani Ostrowski", verifiedBy: officer });
  doc(tx, clubId, u["safety@hangarline.test"]!, { kind: "renters_insurance", issuedOn: addDays(today, -370), expiresOn: addDays(today, -5), reference: "RI-77-11802", details: "Harbourlight Mutual (invented)", verifiedBy: instructor });
  doc(tx, clubId, u["safety@hangarline.test"]!, { kind: "flight_review", issuedOn: monthsBefore(today, 9, 22), details: "Imani Ostrowski", verifiedBy: instructor });

  tx.insert(outsideFlightEntries).values([
    {
      clubId, userId: member, flownOn: addDays(today, -31), aircraftDescription: "Larkspur L-2 rented at Pinecrest Strip (PINESTRIP)", typeGroup: "Larkspur L-2", dayLandings: 2, nightFullStopLandings: 3, note: "Night checkout refresher",
      category: "Airplane", classRating: "Single-engine land", tailwheel: false, dayFullStopLandings: 2, verifiedById: instructor, verifiedAt: ago(30),
    },
    // Still the member's own claim: shown on the board, never counted by a booking guard.
    { clubId, userId: member, flownOn: addDays(today, -45), aircraftDescription: "Tailwheel trainer, Pinecrest Strip (PINESTRIP)", dayLandings: 6, nightFullStopLandings: 0, category: "Airplane", classRating: "Single-engine land", tailwheel: true, dayFullStopLandings: 6 },
  ]).run();
}

function seedReedwaterCheckouts(tx: Tx, clubId: string, u: Ids, today: string) {
  const by = u["instructor@hangarline.test"]!;
  const cert = "CFI 0007719";
  const rows: { email: string; group: string; daysAgo: number; conditions?: string; revoked?: { daysAgo: number; reason: string } }[] = [
    { email: "member@hangarline.test", group: "Larkspur L-2", daysAgo: 600 },
    { email: "member@hangarline.test", group: "Fernwhistle F160", daysAgo: 240, conditions: "Day VFR only until a night check flight in type" },
    { email: "student@hangarline.test", group: "Larkspur L-2", daysAgo: 45, conditions: "Solo in the local practice area only; no passengers" },
    { email: "pilot2@hangarline.test", group: "Fernwhistle F160", daysAgo: 700 },
    { email: "pilot2@hangarline.test", group: "Brightwing BW-4", daysAgo: 500 },
    { email: "pilot2@hangarline.test", group: "Larkspur L-2", daysAgo: 900, revoked: { daysAgo: 30, reason: "Not flown in type for over a year; a check flight is needed first" } },
    { email: "safety@hangarline.test", group: "Fernwhistle F160", daysAgo: 400 },
    { email: "safety@hangarline.test", group: "Brightwing BW-4", daysAgo: 380 },
    { email: "admin@hangarline.test", group: "Larkspur L-2", daysAgo: 800 },
    { email: "treasurer@hangarline.test", group: "Larkspur L-2", daysAgo: 640 },
    { email: "maintenance@hangarline.test", group: "Fernwhistle F160", daysAgo: 520 },
    { email: "twoclubs@hangarline.test", group: "Larkspur L-2", daysAgo: 300 },
  ];
  tx.insert(checkouts).values(rows.map((r) => ({
    clubId, userId: u[r.email]!, typeGroup: r.group, checkedOutOn: addDays(today, -r.daysAgo), instructorId: by, instructorCertificateNumber: cert, conditions: r.conditions ?? null,
    revokedAt: r.revoked ? ago(r.revoked.daysAgo) : null, revokedById: r.revoked ? by : null, revokeReason: r.revoked?.reason ?? null,
  }))).run();
}

function seedOtherClubs(tx: Tx, byKey: Record<string, Club>, u: Ids) {
  const cw = byKey.cottonwood;
  if (cw) {
    const officer = u["cottonwood.maint@hangarline.test"]!;
    insertBulletin(tx, {
      id: newId(), clubId: cw.id, version: 1, status: "published", title: "Hangar door track repaired", urgency: "routine", audience: "everyone",
      bodyMarkdown: "The north hangar door runs freely again. Still walk it the whole way and keep wingtips clear of the frame.", createdById: officer, publishedById: officer, publishedAt: ago(8), createdAt: ago(8), updatedAt: ago(8),
    });
    tx.insert(checkouts).values({ clubId: cw.id, userId: u["cottonwood.pilot@hangarline.test"]!, typeGroup: "Larkspur L-2", checkedOutOn: addDays(isoDateInTimeZone(new Date(), cw.timeZone), -200), instructorId: u["twoclubs@hangarline.test"]!, instructorCertificateNumber: "CFI 0006624" }).run();
  }
  const sb = byKey.silberau;
  if (sb) {
    const officer = u["silberau.technik@hangarline.test"]!;
    insertBulletin(tx, {
      id: newId(), clubId: sb.id, version: 1, status: "published", title: "Fuel sampling after rain", urgency: "priority", audience: "everyone",
      acknowledgeBy: addDays(isoDateInTimeZone(new Date(), sb.timeZone), 14),
      bodyMarkdown: "After heavy rain, drain every sump until the sample is clear and free of water, then drain once more.", createdById: officer, publishedById: officer, publishedAt: ago(4), createdAt: ago(4), updatedAt: ago(4),
    });
  }
}

export function seedSafety(db: Db, foundation: SeededFoundation): void {
  const { clubIds, userIds } = foundation;
  const rows = db.select().from(clubs).where(inArray(clubs.id, Object.values(clubIds))).all();
  const byKey: Record<string, Club> = {};
  for (const [key, id] of Object.entries(clubIds)) {
    const c = rows.find((r) => r.id === id);
    if (c) byKey[key] = c;
  }
  db.transaction((tx) => {
    const lake = byKey.reedwater;
    if (lake) {
      const today = isoDateInTimeZone(new Date(), lake.timeZone);
      const plane = tx.select({ id: aircraft.id }).from(aircraft).where(and(eq(aircraft.clubId, lake.id), eq(aircraft.typeGroup, "Fernwhistle F160"))).get()?.id;
      seedReedwaterBulletins(tx, lake.id, userIds, today);
      seedReedwaterReports(tx, lake.id, userIds, today, plane, lake.timeZone);
      seedReedwaterPeople(tx, lake.id, userIds, today);
      seedReedwaterCheckouts(tx, lake.id, userIds, today);
    }
    seedOtherClubs(tx, byKey, userIds);
  });
}
