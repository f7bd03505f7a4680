"use server";
import { safetyReports } from "@/db/schema";
import { listAudienceCandidates } from "@/db/queries/safety-bulletins";
import { getClubAircraft } from "@/db/queries/safety-reports";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { compareIsoDates } from "@/lib/dates";
import { enqueueEmails } from "@/lib/email/outbox";
import { kickOutbox } from "@/lib/email/runner";
import { appUrl } from "@/lib/server/urls";
import { fileReportSchema } from "@/lib/validation/safety";
import { clubToday } from "./bulletin-publishing";

/**
 * Files a confidential safety report. Anonymous means absent, not hidden: reporter_id is not
 * written, no audit row names the filer, nothing of the request (address, browser) is kept,
 * and the stored instants are rounded down to the UTC day so they cannot be lined up with
 * other records. The officers' notice says only that a report arrived.
 */
export const fileReport = clubAction({
  schema: fileReportSchema,
  permission: ["create", "SafetyReport"],
  success: "Report filed. Thank you.",
  run(tx, ctx, input) {
    const { club, user } = ctx;
    if (compareIsoDates(input.occurredOn, clubToday(ctx)) > 0) throw new ActionError("Some fields need attention; nothing was saved.", { occurredOn: ["The date cannot be in the future."] });
    if (input.aircraftId && !getClubAircraft(tx, club.id, input.aircraftId)) {
      throw new ActionError("Some fields need attention; nothing was saved.", { aircraftId: ["Choose one of the club's aircraft, or none."] });
    }
    const now = new Date();
    const stamp = input.anonymous ? new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate())) : now;
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
    const [row] = tx
      .insert(safetyReports)
      .values(input.anonymous ? values : { ...values, reporterId: user.id })
      .returning({ id: safetyReports.id })
      .all();
    const officers = listAudienceCandidates(tx, club.id).filter((m) => m.roles.includes("safety"));
    enqueueEmails(
      tx,
      officers.map((o) => ({
        clubId: club.id,
        to: o.email,
        subject: "A safety report was filed",
        template: "notice" as const,
        payload: { title: "A safety report was filed", clubName: club.name, paragraphs: ["A member filed a confidential safety report. Read and triage it in Hangarline."], actionUrl: appUrl(`/clubs/${club.slug}/safety/reports`), actionLabel: "Open the reports" },
      })),
    );
    const base = `/clubs/${club.slug}/safety/reports`;
    if (input.anonymous) {
      return { message: "Filed anonymously. It is not linked to you, so it will not appear in your list.", redirectTo: `${base}?filed=anonymous` };
    }
    return { data: { reportId: row!.id }, redirectTo: `${base}/${row!.id}?filed=1` };
  },
  after: () => kickOutbox(),
});
