"use server";
import { listBookingsInRange } from "@/db/queries/bookings";
import { getBlock, insertBlock, removeBlockRow } from "@/db/queries/bookings-schedule";
import { getAircraft } from "@/db/queries/fleet";
import { ActionError } from "@/lib/actions/action-state";
import { clubAction } from "@/lib/actions/create-action";
import { formatLocalTime, localTimeToInstant } from "@/lib/fleet/time";
import { writeAudit } from "@/lib/server/audit";
import { createBlockSchema, removeBlockSchema } from "@/lib/validation/bookings";

// Maintenance blocks an aircraft's time on the booking page; bookings over a block are refused
// by the booking path (booking-core). Bookings already made inside the span are named in the
// answer, so maintenance can speak to those members; they are not cancelled here.

export const blockAircraft = clubAction({
  schema: createBlockSchema,
  permission: ["create", "MaintenanceBlock"],
  success: "Blocked.",
  run(tx, { club, user }, input) {
    const plane = getAircraft(tx, club.id, input.aircraftId);
    if (!plane || plane.retiredAt) throw new ActionError("That aircraft was not found in this club.", { aircraftId: ["Choose an aircraft of this club."] }, "not_found");
    const startsAt = localTimeToInstant(input.startsAt, club.timeZone);
    const endsAt = localTimeToInstant(input.endsAt, club.timeZone);
    if (endsAt.getTime() <= startsAt.getTime()) throw new ActionError("Some fields need attention; nothing was saved.", { endsAt: ["The end must be after the start."] });
    if (endsAt.getTime() <= Date.now()) throw new ActionError("Some fields need attention; nothing was saved.", { endsAt: ["The block has already ended: choose an end in the future."] });
    const blockId = insertBlock(tx, { clubId: club.id, aircraftId: plane.id, startsAt, endsAt, reason: input.reason, createdById: user.id });
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "maintenance_block.create", subjectType: "MaintenanceBlock", subjectId: blockId, after: { aircraftId: plane.id, startsAt: startsAt.toISOString(), endsAt: endsAt.toISOString(), reason: input.reason } });
    const inside = listBookingsInRange(tx, club.id, startsAt, endsAt).filter((b) => b.aircraftId === plane.id && (b.status === "reserved" || b.status === "dispatched"));
    const note = inside.length
      ? ` ${inside.length} booking${inside.length === 1 ? " is" : "s are"} already inside it and stay${inside.length === 1 ? "s" : ""} until changed: ${inside.map((b) => `${formatLocalTime(b.startsAt, club.timeZone)} ${b.memberName ?? b.memberEmail}`).join("; ")}.`
      : "";
    return { message: `${plane.registration} blocked for maintenance from ${formatLocalTime(startsAt, club.timeZone)} to ${formatLocalTime(endsAt, club.timeZone)}: “${input.reason}”.${note}`, data: { blockId }, refresh: true };
  },
});

export const removeBlock = clubAction({
  schema: removeBlockSchema,
  permission: ["update", "MaintenanceBlock"],
  success: "Block removed.",
  run(tx, { club, user }, input) {
    const block = getBlock(tx, club.id, input.blockId);
    if (!block) throw new ActionError("That maintenance block was not found in this club.", {}, "not_found");
    if (block.removedAt) return { message: "This block was already removed.", refresh: true };
    removeBlockRow(tx, club.id, block.id, user.id, new Date());
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "maintenance_block.remove", subjectType: "MaintenanceBlock", subjectId: block.id, before: { reason: block.reason } });
    return { message: `Block removed: “${block.reason}”. The time can be booked again.`, refresh: true };
  },
});
