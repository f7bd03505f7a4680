import "server-only";
import type { Tx } from "@/db/client";
import type { Aircraft, Club } from "@/db/schema";
import { listBookingHolders } from "@/db/queries/bookings-holders";
import { enqueueEmails } from "@/lib/email/outbox";
import { formatLocalTime } from "@/lib/fleet/time";
import { appUrl } from "@/lib/server/urls";

/**
 * E-mails (through the outbox, inside the caller's transaction) everyone holding a booking on
 * the aircraft from `effectiveAt` on, when it is grounded by a squawk triaged as grounding.
 * Grounding notices reach them through listBookingHoldersForGrounding instead. Returns how
 * many were queued.
 */
export function emailBookingHoldersOfGrounding(
  tx: Tx,
  club: Pick<Club, "id" | "name" | "slug" | "timeZone">,
  plane: Pick<Aircraft, "id" | "registration" | "make" | "model">,
  grounding: { reason: string; effectiveAt: Date; issuedBy: string },
): number {
  const holders = listBookingHolders(tx, club.id, plane.id, grounding.effectiveAt);
  return enqueueEmails(
    tx,
    holders.map((h) => ({
      clubId: club.id,
      to: h.email,
      subject: `${plane.registration} grounded: ${grounding.reason.slice(0, 80)}`,
      template: "grounding-notice" as const,
      payload: {
        clubName: club.name,
        registration: plane.registration,
        aircraftName: `${plane.make} ${plane.model}`,
        reason: grounding.reason,
        effectiveAt: `${formatLocalTime(grounding.effectiveAt, club.timeZone)} (${club.timeZone})`,
        issuedBy: grounding.issuedBy,
        because: "booking" as const,
        url: appUrl(`/clubs/${club.slug}/bookings`),
      },
    })),
  );
}
