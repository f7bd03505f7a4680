import { listAudienceCandidates } from "@/db/queries/safety-bulletins";
import { SAFETY_DIGEST_TEMPLATE, lastDigestCoveredDay, listDigestClubs, listReportsReceivedBetween } from "@/db/queries/safety-reports";
import type { Db } from "@/db/client";
import { dueDigestBatch } from "@/lib/safety/report-digest";
import { appUrl } from "@/lib/server/urls";
import { enqueueEmails } from "./outbox";

export type DigestTickResult = { clubs: number; messages: number };

/**
 * The scheduled tick: for every club whose digest time has passed, queues one message per safety
 * officer listing the reports received on the whole club days not yet covered. Idempotent: the
 * digest rows in the outbox record the last day covered, and each club's check-and-write runs in
 * one write-locked transaction, so ticks from the in-process timer and from a cron call at the
 * same moment queue one digest. A batch with no new reports writes nothing and is covered by the
 * next one.
 */
export function composeSafetyDigests(db: Db, now = new Date()): DigestTickResult {
  const result: DigestTickResult = { clubs: 0, messages: 0 };
  for (const club of listDigestClubs(db)) {
    const queued = db.transaction(
      (tx) => {
        const batch = dueDigestBatch(now, club.timeZone, lastDigestCoveredDay(tx, club.id));
        if (!batch) return 0;
        const reports = listReportsReceivedBetween(tx, club.id, batch.from, batch.until);
        if (reports.length === 0) return 0;
        const officers = listAudienceCandidates(tx, club.id).filter((m) => m.roles.includes("safety"));
        const base = `/clubs/${club.slug}/safety/reports`;
        const payload = {
          clubName: club.name,
          fromDay: batch.fromDay,
          toDay: batch.toDay,
          count: reports.length,
          anonymousCount: reports.filter((r) => r.anonymous).length,
          reports: reports.map((r) => ({ url: appUrl(`${base}/${r.id}`), occurredOn: r.occurredOn })),
          listUrl: appUrl(base),
        };
        const subject = `${reports.length} new safety ${reports.length === 1 ? "report" : "reports"}`;
        return enqueueEmails(tx, officers.map((o) => ({ clubId: club.id, to: o.email, subject, template: SAFETY_DIGEST_TEMPLATE, payload, at: batch.batchAt })));
      },
      { behavior: "immediate" },
    );
    if (queued > 0) {
      result.clubs++;
      result.messages += queued;
    }
  }
  return result;
}
