import "server-only";
import { and, asc, desc, eq, isNull } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { bulletinAcknowledgements, bulletins, checkouts, memberships, users, type Bulletin } from "@/db/schema";
import { acknowledgementStats, type AckStats } from "@/lib/safety/acknowledgements";
import { isInAudience, resolveAudience, type AudienceCandidate } from "@/lib/safety/audience";
import type { Role } from "@/permissions";

type Reader = Db | Tx;

export function getBulletin(db: Reader, clubId: string, bulletinId: string): Bulletin | undefined {
  return db.select().from(bulletins).where(and(eq(bulletins.clubId, clubId), eq(bulletins.id, bulletinId))).get();
}

export type BulletinListRow = Pick<Bulletin, "id" | "seriesId" | "version" | "status" | "title" | "urgency" | "audience" | "audienceTypeGroup" | "acknowledgeBy" | "publishedAt" | "supersededAt" | "createdAt"> & { authorName: string | null };

/** Published bulletins that are the current version of their series, and drafts for those who write them. */
export function listBulletins(db: Reader, clubId: string, opts: { includeDrafts: boolean; includeSuperseded?: boolean }): BulletinListRow[] {
  const rows = db
    .select({
      id: bulletins.id, seriesId: bulletins.seriesId, version: bulletins.version, status: bulletins.status, title: bulletins.title, urgency: bulletins.urgency,
      audience: bulletins.audience, audienceTypeGroup: bulletins.audienceTypeGroup, acknowledgeBy: bulletins.acknowledgeBy, publishedAt: bulletins.publishedAt,
      supersededAt: bulletins.supersededAt, createdAt: bulletins.createdAt, authorName: users.name,
    })
    .from(bulletins)
    .innerJoin(users, eq(users.id, bulletins.createdById))
    .where(eq(bulletins.clubId, clubId))
    .orderBy(desc(bulletins.publishedAt), desc(bulletins.createdAt))
    .all();
  return rows.filter((r) => (r.status === "draft" ? opts.includeDrafts : opts.includeSuperseded || r.supersededAt === null));
}

/** Every version of one bulletin, oldest first; superseded versions are kept and shown. */
export function listBulletinVersions(db: Reader, clubId: string, seriesId: string): Bulletin[] {
  return db.select().from(bulletins).where(and(eq(bulletins.clubId, clubId), eq(bulletins.seriesId, seriesId))).orderBy(asc(bulletins.version)).all();
}

export type Candidate = AudienceCandidate & { userId: string };

export function listAudienceCandidates(db: Reader, clubId: string): Candidate[] {
  return db
    .select({ userId: users.id, name: users.name, email: users.email, roles: memberships.roles })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.clubId, clubId), eq(memberships.status, "active"), isNull(users.disabledAt)))
    .orderBy(asc(users.name))
    .all();
}

export function listStandingCheckouts(db: Reader, clubId: string): { userId: string; typeGroup: string }[] {
  return db.select({ userId: checkouts.userId, typeGroup: checkouts.typeGroup }).from(checkouts).where(and(eq(checkouts.clubId, clubId), isNull(checkouts.revokedAt))).all();
}

export function audienceOf(db: Reader, clubId: string, bulletin: Pick<Bulletin, "audience" | "audienceTypeGroup">): Candidate[] {
  return resolveAudience(listAudienceCandidates(db, clubId), listStandingCheckouts(db, clubId), { audience: bulletin.audience, typeGroup: bulletin.audienceTypeGroup });
}

export function listAcknowledgements(db: Reader, clubId: string, bulletinId: string): { userId: string; acknowledgedAt: Date }[] {
  return db
    .select({ userId: bulletinAcknowledgements.userId, acknowledgedAt: bulletinAcknowledgements.acknowledgedAt })
    .from(bulletinAcknowledgements)
    .where(and(eq(bulletinAcknowledgements.clubId, clubId), eq(bulletinAcknowledgements.bulletinId, bulletinId)))
    .all();
}

export function getAcknowledgement(db: Reader, clubId: string, bulletinId: string, userId: string) {
  return db
    .select()
    .from(bulletinAcknowledgements)
    .where(and(eq(bulletinAcknowledgements.clubId, clubId), eq(bulletinAcknowledgements.bulletinId, bulletinId), eq(bulletinAcknowledgements.userId, userId)))
    .get();
}

export function bulletinAckStats(db: Reader, clubId: string, bulletin: Bulletin): AckStats {
  return acknowledgementStats(audienceOf(db, clubId, bulletin), listAcknowledgements(db, clubId, bulletin.id));
}

export function isUserInAudience(db: Reader, clubId: string, bulletin: Pick<Bulletin, "audience" | "audienceTypeGroup">, person: { userId: string; roles: readonly Role[] }): boolean {
  const mine = listStandingCheckouts(db, clubId).filter((c) => c.userId === person.userId);
  return isInAudience(person, mine, { audience: bulletin.audience, typeGroup: bulletin.audienceTypeGroup });
}

const URGENCY_ORDER = { urgent: 0, priority: 1, routine: 2 } as const;

/** Current bulletins addressed to this person that they have not acknowledged yet: the home page list. */
export function listBulletinsToAcknowledge(db: Reader, clubId: string, person: { userId: string; roles: readonly Role[] }): Bulletin[] {
  const current = db
    .select({ b: bulletins, ackId: bulletinAcknowledgements.id })
    .from(bulletins)
    .leftJoin(bulletinAcknowledgements, and(eq(bulletinAcknowledgements.bulletinId, bulletins.id), eq(bulletinAcknowledgements.userId, person.userId)))
    .where(and(eq(bulletins.clubId, clubId), eq(bulletins.status, "published"), isNull(bulletins.supersededAt)))
    .all();
  const mine = listStandingCheckouts(db, clubId).filter((c) => c.userId === person.userId);
  return current
    .filter((r) => r.ackId === null && isInAudience(person, mine, { audience: r.b.audience, typeGroup: r.b.audienceTypeGroup }))
    .map((r) => r.b)
    .sort((a, b) => URGENCY_ORDER[a.urgency] - URGENCY_ORDER[b.urgency] || (a.acknowledgeBy ?? "9999").localeCompare(b.acknowledgeBy ?? "9999"));
}
