"use server";
import { getAvailability, insertAvailability, listAvailability, removeAvailabilityRow } from "@/db/queries/bookings-schedule";
import { ActionError } from "@/lib/actions/action-state";
import { clubAction } from "@/lib/actions/create-action";
import { describeLocalWindow, expandWeekly } from "@/lib/bookings/recurrence";
import { overlapping } from "@/lib/bookings/schedule";
import { localTimeToInstant } from "@/lib/fleet/time";
import { writeAudit } from "@/lib/server/audit";
import { createAvailabilitySchema, removeAvailabilitySchema } from "@/lib/validation/bookings";

// An instructor's own available times. Once an instructor keeps any, bookings with them must lie
// inside one (booking-core); the windows are the signed-in instructor's only.

const INVALID = "Some fields need attention; nothing was saved.";

export const addAvailability = clubAction({
  schema: createAvailabilitySchema,
  permission: ["create", "Availability"],
  success: "Available time saved.",
  run(tx, { club, user }, input) {
    const weeks = expandWeekly({ startsAt: input.startsAt, endsAt: input.endsAt }, input.repeatWeeks);
    const spans = weeks.map((w) => ({ ...w, start: localTimeToInstant(w.startsAt, club.timeZone).getTime(), end: localTimeToInstant(w.endsAt, club.timeZone).getTime() }));
    if (spans[0]!.end <= spans[0]!.start) throw new ActionError(INVALID, { endsAt: ["The end must be after the start."] });
    if (spans[0]!.end - spans[0]!.start > 24 * 3_600_000) throw new ActionError(INVALID, { endsAt: ["One available time can be at most 24 hours; add another for the next day."] });
    if (spans.at(-1)!.end <= Date.now()) throw new ActionError(INVALID, { endsAt: ["That time has already passed: choose a time to come."] });
    const existing = listAvailability(tx, club.id, new Date(spans[0]!.start), new Date(spans.at(-1)!.end), user.id).map((a) => ({ start: a.startsAt.getTime(), end: a.endsAt.getTime() }));
    const clash = spans.find((s) => overlapping(s, existing).length);
    if (clash) throw new ActionError(INVALID, { startsAt: [`You already have an available time overlapping ${describeLocalWindow(clash)}: remove it first or choose another time.`] });
    const ids = spans.map((s) => insertAvailability(tx, { clubId: club.id, userId: user.id, startsAt: new Date(s.start), endsAt: new Date(s.end) }));
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "availability.create", subjectType: "Availability", subjectId: ids[0]!, after: { windows: weeks } });
    return { message: `Available: ${weeks.map(describeLocalWindow).join("; ")}.`, data: { ids }, refresh: true };
  },
});

export const removeAvailability = clubAction({
  schema: removeAvailabilitySchema,
  permission: ["update", "Availability"],
  success: "Available time removed.",
  run(tx, { club, user }, input) {
    const row = getAvailability(tx, club.id, input.availabilityId);
    // Another instructor's window is answered like a missing one.
    if (!row || row.userId !== user.id) throw new ActionError("That available time was not found.", {}, "not_found");
    if (row.removedAt) return { message: "This available time was already removed.", refresh: true };
    removeAvailabilityRow(tx, club.id, row.id, new Date());
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "availability.remove", subjectType: "Availability", subjectId: row.id, before: { startsAt: row.startsAt.toISOString(), endsAt: row.endsAt.toISOString() } });
    return { message: "Available time removed. Bookings already made with you stay.", refresh: true };
  },
});
