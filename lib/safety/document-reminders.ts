import { documentExpiryStatus } from "@/lib/currency";
import type { IsoDate } from "@/lib/dates";

export type RemindableDocument = { id: string; expiresOn: IsoDate | null; reminderSentFor: IsoDate | null };

/**
 * Documents whose reminder is due: they expire within the club's reminder window (or have
 * already lapsed) and no reminder has been queued for this expiry date yet. Recording a
 * renewed document gives a new expiry date, so its own reminder comes round again later.
 */
export function documentsDueForReminder<T extends RemindableDocument>(docs: readonly T[], today: IsoDate, warnDays: number): T[] {
  return docs.filter((d) => d.expiresOn !== null && d.reminderSentFor !== d.expiresOn && documentExpiryStatus(d.expiresOn, today, warnDays) !== "valid");
}

/** Of several documents of one kind for one person, the one that counts: the latest issued. */
export function latestByIssue<T extends { issuedOn: IsoDate; createdAt: Date }>(docs: readonly T[]): T | null {
  let best: T | null = null;
  for (const d of docs) {
    if (!best || d.issuedOn > best.issuedOn || (d.issuedOn === best.issuedOn && d.createdAt > best.createdAt)) best = d;
  }
  return best;
}
