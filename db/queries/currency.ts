import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { aircraft, checkouts, flights, medicalCertificates, memberDocuments, outsideFlightEntries, type Club } from "@/db/schema";
import type { LandingEntry } from "@/lib/currency";
import { isClubMember } from "@/lib/safety/audience";
import { summarizeCurrency, type CurrencyInput } from "@/lib/safety/currency-summary";
import type { Role } from "@/permissions";
import { listAudienceCandidates } from "./safety-bulletins";

type Reader = Db | Tx;

type Gathered = {
  landings: Map<string, LandingEntry[]>;
  typeFlights: Map<string, { date: string; typeGroup: string }[]>;
  review: Map<string, string>;
  medical: Map<string, { examDate: string; expiresOn: string }>;
  groups: Map<string, string[]>;
};

function push<T>(map: Map<string, T[]>, key: string, value: T) {
  const list = map.get(key);
  if (list) list.push(value);
  else map.set(key, [value]);
}

// Everything the currency rules need, for one member or for the whole club, in five queries.
function gather(db: Reader, clubId: string, userId?: string): Gathered {
  const g: Gathered = { landings: new Map(), typeFlights: new Map(), review: new Map(), medical: new Map(), groups: new Map() };
  const clubFlights = db
    .select({ pilotId: flights.pilotId, date: flights.flownOn, day: flights.dayLandings, night: flights.nightFullStopLandings, typeGroup: aircraft.typeGroup })
    .from(flights)
    .innerJoin(aircraft, and(eq(aircraft.id, flights.aircraftId), eq(aircraft.clubId, flights.clubId)))
    .where(and(eq(flights.clubId, clubId), userId ? eq(flights.pilotId, userId) : undefined))
    .all();
  for (const f of clubFlights) {
    push(g.landings, f.pilotId, { date: f.date, dayLandings: f.day, nightFullStopLandings: f.night });
    push(g.typeFlights, f.pilotId, { date: f.date, typeGroup: f.typeGroup });
  }
  const outside = db.select().from(outsideFlightEntries).where(and(eq(outsideFlightEntries.clubId, clubId), userId ? eq(outsideFlightEntries.userId, userId) : undefined)).all();
  for (const o of outside) {
    push(g.landings, o.userId, { date: o.flownOn, dayLandings: o.dayLandings, nightFullStopLandings: o.nightFullStopLandings });
    if (o.typeGroup) push(g.typeFlights, o.userId, { date: o.flownOn, typeGroup: o.typeGroup });
  }
  const reviews = db
    .select({ userId: memberDocuments.userId, issuedOn: memberDocuments.issuedOn })
    .from(memberDocuments)
    .where(and(eq(memberDocuments.clubId, clubId), eq(memberDocuments.kind, "flight_review"), userId ? eq(memberDocuments.userId, userId) : undefined))
    .all();
  for (const r of reviews) if (!g.review.has(r.userId) || r.issuedOn > g.review.get(r.userId)!) g.review.set(r.userId, r.issuedOn);
  const medicals = db
    .select({ userId: medicalCertificates.userId, examDate: medicalCertificates.examDate, expiresOn: medicalCertificates.expiresOn })
    .from(medicalCertificates)
    .where(and(eq(medicalCertificates.clubId, clubId), userId ? eq(medicalCertificates.userId, userId) : undefined))
    .all();
  // The latest exam counts, even if an older certificate of a higher class would have run longer.
  for (const m of medicals) if (!g.medical.has(m.userId) || m.examDate > g.medical.get(m.userId)!.examDate) g.medical.set(m.userId, m);
  const standing = db
    .select({ userId: checkouts.userId, typeGroup: checkouts.typeGroup })
    .from(checkouts)
    .where(and(eq(checkouts.clubId, clubId), isNull(checkouts.revokedAt), userId ? eq(checkouts.userId, userId) : undefined))
    .all();
  for (const c of standing) push(g.groups, c.userId, c.typeGroup);
  return g;
}

function inputFor(g: Gathered, club: Pick<Club, "settings">, userId: string, today: string): CurrencyInput {
  return {
    landings: g.landings.get(userId) ?? [],
    typeFlights: g.typeFlights.get(userId) ?? [],
    lastFlightReview: g.review.get(userId) ?? null,
    medicalExpiresOn: g.medical.get(userId)?.expiresOn ?? null,
    checkoutTypeGroups: g.groups.get(userId) ?? [],
    recencyDaysInType: club.settings.recencyDaysInType,
    documentWarnDays: club.settings.documentReminderDays,
    today,
  };
}

export type MemberCurrency = ReturnType<typeof summarizeCurrency>;

export function getMemberCurrency(db: Reader, club: Pick<Club, "id" | "settings">, userId: string, today: string): MemberCurrency {
  return summarizeCurrency(inputFor(gather(db, club.id, userId), club, userId, today));
}

export type CurrencyBoardRow = { userId: string; name: string | null; email: string; roles: Role[]; currency: MemberCurrency };

/** The board: every active club member (mechanics are not members) with their computed currency. */
export function getCurrencyBoard(db: Reader, club: Pick<Club, "id" | "settings">, today: string): CurrencyBoardRow[] {
  const g = gather(db, club.id);
  return listAudienceCandidates(db, club.id)
    .filter((m) => isClubMember(m.roles))
    .map((m) => ({ userId: m.userId, name: m.name, email: m.email, roles: [...m.roles], currency: summarizeCurrency(inputFor(g, club, m.userId, today)) }));
}
