"use server";
import { and, eq } from "drizzle-orm";
import { aircraft, squawks } from "@/db/schema";
import { emailBookingHoldersOfGrounding } from "@/lib/actions/bookings/notify-grounding";
import { kickOutbox } from "@/lib/email/runner";
import { getSquawk, recordSquawkEvent } from "@/db/queries/fleet-squawks";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { triageSquawkSchema } from "@/lib/validation/fleet";

const MESSAGES = {
  grounding: "Triaged as grounding: the aircraft shows grounded until the squawk is closed with a return to service.",
  deferred: "Deferred with its limitation (14 CFR 91.213(d)): the aircraft shows flyable with limits.",
  note: "Kept as a note: it stays on the aircraft's list without limiting it.",
} as const;

export const triageSquawk = clubAction({
  schema: triageSquawkSchema,
  permission: ["triage", "Squawk"],
  success: "Squawk triaged.",
  run(tx, { club, user }, input) {
    const current = getSquawk(tx, club.id, input.squawkId);
    if (!current) throw new ActionError("That squawk was not found in this club.", {}, "not_found");
    if (current.status !== "open") throw new ActionError("That squawk is closed; report a new one if the problem is back.", {}, "conflict");
    const deferred = input.triage === "deferred";
    const change = {
      triage: input.triage,
      limitation: deferred ? input.limitation : null,
      placarded: deferred ? input.placarded : false,
      deferralDeterminedBy: deferred ? input.deferralDeterminedBy : null,
    };
    tx.update(squawks).set(change).where(and(eq(squawks.clubId, club.id), eq(squawks.id, current.id))).run();
    const note = [deferred ? `Limitation: ${input.limitation}. Determined by ${input.deferralDeterminedBy}; placarded inoperative.` : null, input.note].filter(Boolean).join(" ");
    recordSquawkEvent(tx, { clubId: club.id, squawkId: current.id, kind: "triaged", actorId: user.id, fromTriage: current.triage, toTriage: input.triage, note: note || null });
    writeAudit(tx, {
      clubId: club.id,
      actorId: user.id,
      action: "squawk.triage",
      subjectType: "Squawk",
      subjectId: current.id,
      before: { triage: current.triage, limitation: current.limitation, placarded: current.placarded },
      after: change,
    });
    let message: string = MESSAGES[input.triage];
    if (input.triage === "grounding" && current.triage !== "grounding") {
      // Members holding bookings on this aircraft hear about it first, as with a grounding notice.
      const plane = tx.select().from(aircraft).where(and(eq(aircraft.clubId, club.id), eq(aircraft.id, current.aircraftId))).get();
      const told = plane ? emailBookingHoldersOfGrounding(tx, club, plane, { reason: current.description, effectiveAt: new Date(), issuedBy: user.name ?? user.email }) : 0;
      if (told > 0) message += ` ${told} member${told === 1 ? "" : "s"} with bookings on this aircraft will be e-mailed.`;
    }
    return { message, refresh: true };
  },
  after: () => kickOutbox(),
});
