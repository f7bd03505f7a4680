import "server-only";
import type { Tx } from "@/db/client";
import type { Aircraft, Club } from "@/db/schema";
import { listSquawkAlertRecipients } from "@/db/queries/fleet-squawks";
import { enqueueEmails } from "@/lib/email/outbox";
import { appUrl } from "@/lib/server/urls";

export type SquawkAlertCount = { maintenance: number; booking: number };

/**
 * The one "possibly unsafe" alert: a squawk marked as possibly making the aircraft unsafe to
 * fly e-mails, through the outbox inside the caller's transaction, the club's maintenance people
 * and the holders of upcoming bookings on the aircraft (the reporter left out). The squawk report
 * and the preflight (a finding so marked) both call it after `createSquawk`. Returns how many
 * were queued, by why each person heard.
 */
export function alertPossiblyUnsafeSquawk(
  tx: Tx,
  club: Pick<Club, "id" | "name" | "slug">,
  plane: Pick<Aircraft, "id" | "registration" | "make" | "model">,
  squawk: { id: string; description: string; foundDuring: string; reporter: { id: string; name: string | null } },
  now: Date = new Date(),
): SquawkAlertCount {
  const recipients = listSquawkAlertRecipients(tx, club.id, plane.id, now, squawk.reporter.id);
  enqueueEmails(
    tx,
    recipients.map((r) => ({
      clubId: club.id,
      to: r.email,
      subject: `${plane.registration} reported as possibly unsafe: ${squawk.description.slice(0, 70)}`,
      template: "squawk-alert" as const,
      payload: {
        clubName: club.name,
        registration: plane.registration,
        aircraftName: `${plane.make} ${plane.model}`,
        description: squawk.description,
        foundDuring: squawk.foundDuring,
        reportedBy: squawk.reporter.name ?? "A member",
        because: r.why,
        url: appUrl(`/clubs/${club.slug}/aircraft/${plane.id}`),
        squawkId: squawk.id,
      },
    })),
  );
  const maintenance = recipients.filter((r) => r.why === "maintenance").length;
  return { maintenance, booking: recipients.length - maintenance };
}
