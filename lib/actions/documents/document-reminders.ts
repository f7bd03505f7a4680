import { and, eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { medicalCertificates, memberDocuments, type Club } from "@/db/schema";
import { listAudienceCandidates } from "@/db/queries/safety-bulletins";
import { listClubDocuments, listClubMedicals } from "@/db/queries/safety-documents";
import { compareIsoDates } from "@/lib/dates";
import { enqueueEmails } from "@/lib/email/outbox";
import { isClubMember } from "@/lib/safety/audience";
import { documentsDueForReminder, latestByIssue } from "@/lib/safety/document-reminders";
import { DOCUMENT_KIND_LABELS } from "@/lib/safety/labels";
import { appUrl } from "@/lib/server/urls";

type Due = { id: string; userId: string; expiresOn: string | null; reminderSentFor: string | null; label: string; table: "doc" | "medical" };

/**
 * Queues one expiry reminder per document through the outbox, for the document that counts
 * (the newest of each kind per member) when it lapses within the club's documentReminderDays.
 * Idempotent: each expiry date is reminded once, however often this runs.
 */
export function queueDocumentReminders(tx: Tx, club: Pick<Club, "id" | "slug" | "name" | "settings">, today: string): number {
  const people = new Map(listAudienceCandidates(tx, club.id).filter((m) => isClubMember(m.roles)).map((m) => [m.userId, m]));
  const byKind = new Map<string, ReturnType<typeof listClubDocuments>>();
  for (const d of listClubDocuments(tx, club.id)) {
    const key = `${d.userId}:${d.kind}`;
    byKind.set(key, [...(byKind.get(key) ?? []), d]);
  }
  const latest = new Map<string, Due>();
  for (const [key, docs] of byKind) {
    const d = latestByIssue(docs)!;
    latest.set(key, { id: d.id, userId: d.userId, expiresOn: d.expiresOn, reminderSentFor: d.reminderSentFor, label: DOCUMENT_KIND_LABELS[d.kind], table: "doc" });
  }
  // listClubMedicals is newest exam first, so the first row per member is the one that counts.
  for (const m of listClubMedicals(tx, club.id)) {
    const key = `${m.userId}:medical`;
    if (!latest.has(key)) latest.set(key, { id: m.id, userId: m.userId, expiresOn: m.expiresOn, reminderSentFor: m.reminderSentFor, label: "Medical", table: "medical" });
  }
  const due = documentsDueForReminder([...latest.values()].filter((d) => people.has(d.userId)), today, club.settings.documentReminderDays);
  if (due.length === 0) return 0;
  const url = appUrl(`/clubs/${club.slug}/me`);
  enqueueEmails(
    tx,
    due.map((d) => {
      const person = people.get(d.userId)!;
      const lapsed = compareIsoDates(d.expiresOn!, today) < 0;
      return {
        clubId: club.id,
        to: person.email,
        subject: lapsed ? `${d.label} expired on ${d.expiresOn}` : `${d.label} expires on ${d.expiresOn}`,
        template: "document-expiry" as const,
        payload: { clubName: club.name, memberName: person.name ?? person.email, documentLabel: d.label, expiresOn: d.expiresOn!, lapsed, url },
      };
    }),
  );
  for (const d of due) {
    if (d.table === "doc") tx.update(memberDocuments).set({ reminderSentFor: d.expiresOn }).where(and(eq(memberDocuments.clubId, club.id), eq(memberDocuments.id, d.id))).run();
    else tx.update(medicalCertificates).set({ reminderSentFor: d.expiresOn }).where(and(eq(medicalCertificates.clubId, club.id), eq(medicalCertificates.id, d.id))).run();
  }
  return due.length;
}
