import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { calendarFeedTokens, clubs, users, type CalendarFeedToken } from "@/db/schema";
import { hashToken, openSecret, sealSecret } from "@/lib/server/tokens";

// Calendar links: found by the SHA-256 of the secret in the URL; the secret is kept sealed so its
// owner can see the same link again on another device (making a new one would stop the old one).

const SEAL_PURPOSE = "calendar-feed";

type Handle = Db | Tx;

export function getLiveFeedToken(db: Handle, clubId: string, userId: string): CalendarFeedToken | undefined {
  return db.select().from(calendarFeedTokens).where(and(eq(calendarFeedTokens.clubId, clubId), eq(calendarFeedTokens.userId, userId), isNull(calendarFeedTokens.revokedAt))).get();
}

export function revokeFeedTokens(tx: Tx, clubId: string, userId: string, at: Date): number {
  return tx
    .update(calendarFeedTokens)
    .set({ revokedAt: at })
    .where(and(eq(calendarFeedTokens.clubId, clubId), eq(calendarFeedTokens.userId, userId), isNull(calendarFeedTokens.revokedAt)))
    .run().changes;
}

export function insertFeedToken(tx: Tx, clubId: string, userId: string, secret: string): string {
  const [row] = tx.insert(calendarFeedTokens).values({ clubId, userId, tokenHash: hashToken(secret), secretSealed: sealSecret(secret, SEAL_PURPOSE) }).returning({ id: calendarFeedTokens.id }).all();
  return row!.id;
}

/** The link's owner and club, or undefined for an unknown or revoked secret (both a 404). */
export function findFeedBySecret(db: Handle, secret: string) {
  if (!/^[\w-]{20,100}$/.test(secret)) return undefined;
  return db
    .select({ token: calendarFeedTokens, club: clubs, personName: users.name, personEmail: users.email })
    .from(calendarFeedTokens)
    .innerJoin(clubs, eq(clubs.id, calendarFeedTokens.clubId))
    .innerJoin(users, eq(users.id, calendarFeedTokens.userId))
    .where(and(eq(calendarFeedTokens.tokenHash, hashToken(secret)), isNull(calendarFeedTokens.revokedAt)))
    .get();
}

export function markFeedFetched(db: Handle, tokenId: string, at: Date): void {
  db.update(calendarFeedTokens).set({ lastFetchedAt: at }).where(eq(calendarFeedTokens.id, tokenId)).run();
}

/** The live link's secret for its owner to see again, or null when it cannot be shown (made before seals, or under another AUTH_SECRET). */
export function readFeedSecret(token: Pick<CalendarFeedToken, "secretSealed" | "tokenHash">): string | null {
  const secret = openSecret(token.secretSealed, SEAL_PURPOSE);
  // A seal that opens to another secret than the one the link answers to is never shown.
  return secret && hashToken(secret) === token.tokenHash ? secret : null;
}
