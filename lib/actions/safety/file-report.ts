"use server";
import { safetyReports } from "@/db/schema";
import { listAudienceCandidates } from "@/db/queries/safety-bulletins";
import { getClubAircraft } from "@/db/queries/safety-reports";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { compareIsoDates } from "@/lib/dates";
import { enqueueEmails } from "@/lib/email/outbox";
import { kickOutbox } from "@/lib/email/runner";
import { anonymousReportStamp } from "@/lib/safety/report-digest";
import { REPORT_FILED_MESSAGE, reportFiledPath } from "@/lib/safety/report-filed";
import { appUrl } from "@/lib/server/urls";
import { fileReportSchema } from "@/lib/validation/safety";
import { clubToday } from "./bulletin-publishing";

/**
 * Files a confidential safety report. Anonymous means absent, not hidden: reporter_id is not
 * written, no audit row names the filer, nothing of the request (address, browser) is kept, and
 * the stored instants are the start of the club day it was filed on. Nothing is queued for an
 * anonymous report: officers learn of it from the daily digest (lib/email/safety-digest.ts),
 * composed at a fixed time for whole club days. A named report still tells the officers at once.
 * The filer gets the same answer and the same page for both kinds.
 */
export const fileReport = clubAction({
  schema: fileReportSchema,
  permission: ["create", "SafetyReport"],
  success: REPORT_FILED_MESSAGE,
  // An anonymous report's idempotency key row keeps no actor and only the day (lib/server/idempotency.ts).
  anonymous: (input) => input.anonymous,
  run(tx, ctx, input) {
    const { club, user } = ctx;
    if (compareIsoDates(input.occurredOn, clubToday(ctx)) > 0) throw new ActionError("Some fields need attention; nothing was saved.", { occurredOn: ["The date cannot be in the future."] });
    if (input.aircraftId && !getClubAircraft(tx, club.id, input.aircraftId)) {
      throw new ActionError("Some fields need attention; nothing was saved.", { aircraftId: ["Choose one of the club's aircraft, or none."] });
    }
    const now = new Date();
    const stamp = input.anonymous ? anonymousReportStamp(now, club.timeZone) : now;
    const values = {
      clubId: club.id,
      anonymous: input.anonymous,
      occurredOn: input.occurredOn,
      occurredTime: input.occurredTime ?? null,
      location: input.location,
      aircraftId: input.aircraftId ?? null,
      whatHappened: input.whatHappened,
      contributingFactors: input.contributingFactors,
      factorsNote: input.factorsNote ?? null,
      createdAt: stamp,
      updatedAt: stamp,
    };
    tx.insert(safetyReports).values(input.anonymous ? values : { ...values, reporterId: user.id }).run();
    if (!input.anonymous) {
      const officers = listAudienceCandidates(tx, club.id).filter((m) => m.roles.includes("safety"));
      enqueueEmails(
        tx,
        officers.map((o) => ({
          clubId: club.id,
          to: o.email,
          subject: "A named safety report was filed",
          template: "notice" as const,
          payload: { title: "A named safety report was filed", clubName: club.name, paragraphs: ["A member filed a safety report under their name. Read and triage it in Hangarline."], actionUrl: appUrl(`/clubs/${club.slug}/safety/reports`), actionLabel: "Open the reports" },
        })),
      );
    }
    return { message: REPORT_FILED_MESSAGE, redirectTo: reportFiledPath(club.slug) };
  },
  after: (_ctx, input) => {
    if (!input.anonymous) kickOutbox();
  },
});
