import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { aircraft, checkouts, flights, medicalCertificates, memberDocuments, outsideFlightEntries, type Club } from "@/db/schema";
import { distinctClasses, type AircraftClass, type LandingEntry } from "@/lib/currency";
import { isClubMember } from "@/lib/safety/audience";
import { summarizeCurrency, type Claimable, type CurrencyInput } from "@/lib/safety/currency-summary";
import type { Role } from "@/permissions";
import { listAudienceCandidates } from "./safety-bulletins";

type Reader = Db | Tx;

type Gathered = {
  landings: Map<string, (LandingEntry & Claimable)[]>;
  typeFlights: Map<string, ({ date: string; typeGroup: string } & Claimable)[]>;
  /** Latest verified flight review, and the latest including the member's own claims. */
  review: Map<string, string>;
  claimedReview: Map<string, string>;
  medical: Map<string, { examDate: string; expiresOn: string }>;
  claimedMedical: Map<string, { examDate: string; expiresOn: string }>;
  groups: Map<string, string[]>;
  classes: AircraftClass[];
};

function push<T>(map: Map<string, T[]>, key: string, value: T) {
  const list = map.get(key);
  if (list) list.push(value);
  else map.set(key, [value]);
}

// Everything the currency rules need, for one member or for the whole club, in six queries.
// The club's own flight log counts as verified (the club recorded it); outside flights, flight
// reviews and medicals count only once an instructor or the safety officer verified them.
function gather(db: Reader, clubId: string, userId?: string): Gathered {
  const g: Gathered = { landings: new Map(), typeFlights: new Map(), review: new Map(), claimedReview: new Map(), medical: new Map(), claimedMedical: new Map(), groups: new Map(), classes: [] };
  g.classes = distinctClasses(
    db.select({ category: aircraft.category, classRating: aircraft.classRating, tailwheel: aircraft.tailwheel }).from(aircraft).where(and(eq(aircraft.clubId, clubId), isNull(aircraft.retiredAt))).all(),
  );
  const clubFlights = db
    .select({
      pilotId: flights.pilotId, date: flights.flownOn, day: flights.dayLandings, night: flights.nightFullStopLandings, dayFull: flights.dayFullStopLandings,
      typeGroup: aircraft.typeGroup, category: aircraft.category, classRating: aircraft.classRating, tailwheel: aircraft.tailwheel,
    })
    .from(flights)
    .innerJoin(aircraft, and(eq(aircraft.id, flights.aircraftId), eq(aircraft.clubId, flights.clubId)))
    .where(and(eq(flights.clubId, clubId), userId ? eq(flights.pilotId, userId) : undefined))
    .all();
  for (const f of clubFlights) {
    push(g.landings, f.pilotId, { date: f.date, dayLandings: f.day, nightFullStopLandings: f.night, dayFullStopLandings: f.dayFull, category: f.category, classRating: f.classRating, tailwheel: f.tailwheel });
    push(g.typeFlights, f.pilotId, { date: f.date, typeGroup: f.typeGroup });
  }
  const outside = db.select().from(outsideFlightEntries).where(and(eq(outsideFlightEntries.clubId, clubId), userId ? eq(outsideFlightEntries.userId, userId) : undefined)).all();
  for (const o of outside) {
    const claimed = o.verifiedAt === null;
    push(g.landings, o.userId, { date: o.flownOn, dayLandings: o.dayLandings, nightFullStopLandings: o.nightFullStopLandings, dayFullStopLandings: o.dayFullStopLandings, category: o.category, classRating: o.classRating, tailwheel: o.tailwheel, claimed });
    if (o.typeGroup) push(g.typeFlights, o.userId, { date: o.flownOn, typeGroup: o.typeGroup, claimed });
  }
  const reviews = db
    .select({ userId: memberDocuments.userId, issuedOn: memberDocuments.issuedOn, verifiedAt: memberDocuments.verifiedAt })
    .from(memberDocuments)
    .where(and(eq(memberDocuments.clubId, clubId), eq(memberDocuments.kind, "flight_review"), userId ? eq(memberDocuments.userId, userId) : undefined))
    .all();
  for (const r of reviews) {
    if (r.verifiedAt !== null && (!g.review.has(r.userId) || r.issuedOn > g.review.get(r.userId)!)) g.review.set(r.userId, r.issuedOn);
    if (!g.claimedReview.has(r.userId) || r.issuedOn > g.claimedReview.get(r.userId)!) g.claimedReview.set(r.userId, r.issuedOn);
  }
  const medicals = db
    .select({ userId: medicalCertificates.userId, examDate: medicalCertificates.examDate, expiresOn: medicalCertificates.expiresOn, verifiedAt: medicalCertificates.verifiedAt })
    .from(medicalCertificates)
    .where(and(eq(medicalCertificates.clubId, clubId), userId ? eq(medicalCertificates.userId, userId) : undefined))
    .all();
  // The latest exam counts, even if an older certificate of a higher class would have run longer;
  // for the guards the latest verified exam, and the latest of all is shown as the claim.
  for (const m of medicals) {
    if (m.verifiedAt !== null && (!g.medical.has(m.userId) || m.examDate > g.medical.get(m.userId)!.examDate)) g.medical.set(m.userId, m);
    if (!g.claimedMedical.has(m.userId) || m.examDate > g.claimedMedical.get(m.userId)!.examDate) g.claimedMedical.set(m.userId, m);
  }
  const standing = db
    .select({ userId: checkouts.userId, typeGroup: checkouts.typeGroup })
    .from(checkouts)
    .where(and(eq(checkouts.clubId, clubId), isNull(checkouts.revokedAt), userId ? eq(checkouts.userId, userId) : undefined))
    .all();
  for (const c of standing) push(g.groups, c.userId, c.typeGroup);
  return g;
}

function inputFor(g: Gathered, club: Pick<Club, "settings">, userId: string, today: string, extraClasses: AircraftClass[] = []): CurrencyInput {
  const review = g.review.get(userId) ?? null;
  const claimedReview = g.claimedReview.get(userId) ?? null;
  const medical = g.medical.get(userId) ?? null;
  const claimedMedical = g.claimedMedical.get(userId) ?? null;
  return {
    landings: g.landings.get(userId) ?? [],
    typeFlights: g.typeFlights.get(userId) ?? [],
    lastFlightReview: review,
    claimedFlightReview: claimedReview !== review ? claimedReview : null,
    medicalExpiresOn: medical?.expiresOn ?? null,
    claimedMedicalExpiresOn: claimedMedical && claimedMedical !== medical ? claimedMedical.expiresOn : null,
    classes: extraClasses.length ? distinctClasses([...g.classes, ...extraClasses]) : g.classes,
    checkoutTypeGroups: g.groups.get(userId) ?? [],
    recencyDaysInType: club.settings.recencyDaysInType,
    documentWarnDays: club.settings.documentReminderDays,
    today,
  };
}

export type MemberCurrency = ReturnType<typeof summarizeCurrency>;

/** One member's currency; `extraClasses` adds classes beyond the club's fleet (a booked aircraft). */
export function getMemberCurrency(db: Reader, club: Pick<Club, "id" | "settings">, userId: string, today: string, extraClasses: AircraftClass[] = []): MemberCurrency {
  return summarizeCurrency(inputFor(gather(db, club.id, userId), club, userId, today, extraClasses));
}

export type CurrencyBoardRow = { userId: string; name: string | null; email: string; roles: Role[]; currency: MemberCurrency };

/** The board: every active club member (mechanics are not members) with their computed currency. */
export function getCurrencyBoard(db: Reader, club: Pick<Club, "id" | "settings">, today: string): CurrencyBoardRow[] {
  const g = gather(db, club.id);
  return listAudienceCandidates(db, club.id)
    .filter((m) => isClubMember(m.roles))
    .map((m) => ({ userId: m.userId, name: m.name, email: m.email, roles: [...m.roles], currency: summarizeCurrency(inputFor(g, club, m.userId, today)) }));
}

export type ClaimRow = {
  kind: "flight_review" | "medical" | "outside_flight";
  id: string;
  userId: string;
  /** What the claim says, in the words the board may show (a medical: its expiry date only). */
  what: string;
  /** The member's own file on the record (a document's upload), if any. */
  uploadId: string | null;
};

/**
 * Every claim waiting for verification in the club: flight reviews, medicals and outside flights
 * members recorded about themselves and nobody has verified yet. Oldest claim first.
 */
export function listClaims(db: Reader, clubId: string): ClaimRow[] {
  const rows: (ClaimRow & { at: number })[] = [];
  for (const r of db.select().from(memberDocuments).where(and(eq(memberDocuments.clubId, clubId), eq(memberDocuments.kind, "flight_review"), isNull(memberDocuments.verifiedAt))).all()) {
    rows.push({ kind: "flight_review", id: r.id, userId: r.userId, what: `Flight review of ${r.issuedOn}${r.details ? ` (${r.details})` : ""}`, uploadId: r.uploadId, at: r.createdAt.getTime() });
  }
  for (const r of db.select().from(medicalCertificates).where(and(eq(medicalCertificates.clubId, clubId), isNull(medicalCertificates.verifiedAt))).all()) {
    rows.push({ kind: "medical", id: r.id, userId: r.userId, what: `Medical, expires after ${r.expiresOn}`, uploadId: null, at: r.createdAt.getTime() });
  }
  for (const r of db.select().from(outsideFlightEntries).where(and(eq(outsideFlightEntries.clubId, clubId), isNull(outsideFlightEntries.verifiedAt))).all()) {
    const cls = r.category && r.classRating ? `${r.category}, ${r.classRating}${r.tailwheel ? ", tailwheel" : ""}` : "class not recorded";
    const full = r.dayFullStopLandings === null ? "" : ` (${r.dayFullStopLandings} to a full stop)`;
    rows.push({ kind: "outside_flight", id: r.id, userId: r.userId, what: `Flight of ${r.flownOn} in ${r.aircraftDescription} (${cls}): ${r.dayLandings} day landings${full}, ${r.nightFullStopLandings} night full stops`, uploadId: null, at: r.createdAt.getTime() });
  }
  return rows.sort((a, b) => a.at - b.at).map(({ at: _at, ...r }) => r);
}
