// Shared set-up for the bookings integration tests: the whole demo scenario, pilots whose
// records are made to order, and booking windows in the club's own time zone.
import { and, eq } from "drizzle-orm";
import { aircraft, checkouts, clubs, medicalCertificates, memberDocuments, memberships, outsideFlightEntries, users, type Club } from "@/db/schema";
import { seedDemo } from "@/db/seed/index";
import { addDays, isoDateInTimeZone } from "@/lib/dates";
import { clubBySlug, db } from "./helpers";

let seeded = false;
export async function seedScenario(): Promise<void> {
  if (seeded) return;
  await seedDemo(db());
  seeded = true;
}

export const ALL_GUARDS = ["grounded", "inspectionDue", "notCheckedOut", "notCurrent", "flightReview", "medicalExpired", "inArrears", "statusUnknown", "limitations"];

export function planeId(slug: string, registration: string): string {
  const club = clubBySlug(slug);
  const row = db().select().from(aircraft).where(and(eq(aircraft.clubId, club.id), eq(aircraft.registration, registration))).get();
  if (!row) throw new Error(`No aircraft ${registration}`);
  return row.id;
}

/** "YYYY-MM-DDTHH:MM" `days` from today in the club's zone. */
export function localAt(club: Pick<Club, "timeZone">, days: number, time: string): string {
  return `${addDays(isoDateInTimeZone(new Date(), club.timeZone), days)}T${time}`;
}

export function setGuards(slug: string, guards: Partial<Club["settings"]["bookingGuards"]>, extra: Partial<Club["settings"]> = {}): void {
  const club = clubBySlug(slug);
  db().update(clubs).set({ settings: { ...club.settings, ...extra, bookingGuards: { ...club.settings.bookingGuards, ...guards } } }).where(eq(clubs.id, club.id)).run();
}

/**
 * A member of the club with exactly the records asked for: checkouts by type group, a medical
 * running out on `medicalExpiresOn`, a flight review given on `flightReviewOn`. The records are
 * verified by the instructor (they count), unless `claimed` leaves them as the member's claims.
 */
export function makePilot(slug: string, email: string, records: { checkouts?: string[]; medicalExpiresOn?: string | null; flightReviewOn?: string | null; flewTypeDaysAgo?: number; claimed?: boolean }): string {
  const club = clubBySlug(slug);
  const [u] = db().insert(users).values({ email, name: email.split("@")[0]! }).returning({ id: users.id }).all();
  const userId = u!.id;
  const today = isoDateInTimeZone(new Date(), club.timeZone);
  db().insert(memberships).values({ clubId: club.id, userId, roles: ["member"], joinedOn: today }).run();
  const instructor = db().select({ id: users.id }).from(users).where(eq(users.email, "instructor@hangarline.test")).get()!;
  const verified = records.claimed ? {} : { verifiedById: instructor.id, verifiedAt: new Date() };
  for (const group of records.checkouts ?? []) {
    db().insert(checkouts).values({ clubId: club.id, userId, typeGroup: group, checkedOutOn: addDays(today, -30), instructorId: instructor.id, instructorCertificateNumber: "CFI 0000001" }).run();
  }
  if (records.medicalExpiresOn) {
    db().insert(medicalCertificates).values({ clubId: club.id, userId, kind: "faa_class", medicalClass: 3, examDate: addDays(today, -400), expiresOn: records.medicalExpiresOn, recordedById: userId, ...verified }).run();
  }
  if (records.flightReviewOn) {
    db().insert(memberDocuments).values({ clubId: club.id, userId, kind: "flight_review", issuedOn: records.flightReviewOn, recordedById: userId, ...verified }).run();
  }
  if (records.flewTypeDaysAgo !== undefined) {
    for (const group of records.checkouts ?? []) {
      db().insert(outsideFlightEntries).values({ clubId: club.id, userId, flownOn: addDays(today, -records.flewTypeDaysAgo), typeGroup: group, aircraftDescription: `${group} (test)`, dayLandings: 3, nightFullStopLandings: 0, category: "Airplane", classRating: "Single-engine land", tailwheel: false, ...verified }).run();
    }
  }
  return userId;
}
