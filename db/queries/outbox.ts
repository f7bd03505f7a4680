import "server-only";
import { desc, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { emailOutbox } from "@/db/schema";

export function listClubOutbox(db: Db, clubId: string, limit = 200) {
  return db
    .select({ id: emailOutbox.id, toAddress: emailOutbox.toAddress, subject: emailOutbox.subject, status: emailOutbox.status, attempts: emailOutbox.attempts, lastError: emailOutbox.lastError, createdAt: emailOutbox.createdAt, sentAt: emailOutbox.sentAt })
    .from(emailOutbox)
    .where(eq(emailOutbox.clubId, clubId))
    .orderBy(desc(emailOutbox.createdAt))
    .limit(limit)
    .all();
}
