"use server";
import { groundingNotices } from "@/db/schema";
import { getAircraft } from "@/db/queries/fleet";
import { listGroundingNoticeRecipients } from "@/db/queries/fleet-notices";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { enqueueEmails } from "@/lib/email/outbox";
import { kickOutbox } from "@/lib/email/runner";
import { formatLocalTime, localTimeToInstant } from "@/lib/fleet/time";
import { writeAudit } from "@/lib/server/audit";
import { appUrl } from "@/lib/server/urls";
import { issueNoticeSchema } from "@/lib/validation/fleet";

export const issueGroundingNotice = clubAction({
  schema: issueNoticeSchema,
  permission: ["create", "GroundingNotice"],
  success: "Grounding notice issued; every member is being e-mailed.",
  run(tx, { club, user }, input) {
    const plane = getAircraft(tx, club.id, input.aircraftId);
    if (!plane || plane.retiredAt) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
    const now = new Date();
    const effectiveAt = input.effectiveAt ? localTimeToInstant(input.effectiveAt, club.timeZone) : now;
    const [row] = tx
      .insert(groundingNotices)
      .values({ clubId: club.id, aircraftId: plane.id, category: input.category, reason: input.reason, effectiveAt, issuedById: user.id })
      .returning({ id: groundingNotices.id })
      .all();
    const recipients = listGroundingNoticeRecipients(tx, club.id, plane.id, effectiveAt);
    const when = `${formatLocalTime(effectiveAt, club.timeZone)} (${club.timeZone})`;
    const sent = enqueueEmails(
      tx,
      recipients.map((r) => ({
        clubId: club.id,
        to: r.email,
        subject: `${plane.registration} grounded: ${input.reason.slice(0, 80)}`,
        template: "grounding-notice" as const,
        payload: {
          clubName: club.name,
          registration: plane.registration,
          aircraftName: `${plane.make} ${plane.model}`,
          reason: input.reason,
          effectiveAt: when,
          issuedBy: user.name ?? user.email,
          because: r.why,
          url: appUrl(`/clubs/${club.slug}/aircraft/${plane.id}`),
        },
      })),
    );
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "grounding.issue", subjectType: "GroundingNotice", subjectId: row!.id, after: { aircraftId: plane.id, category: input.category, reason: input.reason, effectiveAt: effectiveAt.toISOString(), recipients: sent } });
    return { message: `Grounding notice issued; ${sent} members are being e-mailed.`, data: { noticeId: row!.id, recipients: sent }, refresh: true };
  },
  after: () => kickOutbox(),
});
