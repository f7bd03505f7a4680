import type { Db } from "@/db/client";
import { listBookingsToRemind, listReminderClubs, recordReminder } from "@/db/queries/bookings-reminders";
import { addDays } from "@/lib/dates";
import { reminderDay, reminderDue } from "@/lib/bookings/reminders";
import { localTimeToInstant } from "@/lib/fleet/time";
import { appUrl } from "@/lib/server/urls";
import { enqueueEmail } from "./outbox";

export type ReminderTickResult = { bookings: number; messages: number };

const DAY = new Intl.DateTimeFormat("en-US", { weekday: "long", month: "short", day: "numeric", timeZone: "UTC" });
const clock = (d: Date, timeZone: string) => new Intl.DateTimeFormat("en-GB", { timeZone, hour: "2-digit", minute: "2-digit", hourCycle: "h23" }).format(d);

/**
 * Queues the day-before reminder for every reserved booking that starts on the club's next
 * calendar day (in the club's time zone), to the member and the instructor aboard. Idempotent:
 * each booking and start time is reminded once (booking_reminders, written in the same
 * write-locked transaction as the messages), however often the tick runs.
 */
export function composeBookingReminders(db: Db, now = new Date()): ReminderTickResult {
  const result: ReminderTickResult = { bookings: 0, messages: 0 };
  for (const club of listReminderClubs(db)) {
    const day = reminderDay(now, club.timeZone);
    const from = localTimeToInstant(`${day}T00:00`, club.timeZone);
    const to = localTimeToInstant(`${addDays(day, 1)}T00:00`, club.timeZone);
    const counts = db.transaction(
      (tx) => {
        let bookings = 0;
        let messages = 0;
        for (const b of listBookingsToRemind(tx, club.id, from, to)) {
          if (!reminderDue(b.startsAt, now, club.timeZone)) continue;
          const when = `${DAY.format(new Date(`${day}T12:00:00Z`))}, ${clock(b.startsAt, club.timeZone)}–${clock(b.endsAt, club.timeZone)} (club time, ${club.timeZone})`;
          const url = appUrl(`/clubs/${club.slug}/bookings/${b.id}`);
          const memberName = b.memberName ?? b.memberEmail;
          const instructorName = b.instructorName ?? b.instructorEmail;
          const first = enqueueEmail(tx, {
            clubId: club.id, to: b.memberEmail, subject: `Tomorrow: ${b.registration} at ${clock(b.startsAt, club.timeZone)}`, template: "booking-reminder",
            payload: { clubName: club.name, personName: memberName, when, registration: b.registration, withWhom: instructorName ? `You fly with ${instructorName}` : null, url },
          });
          messages++;
          if (b.instructorEmail) {
            enqueueEmail(tx, {
              clubId: club.id, to: b.instructorEmail, subject: `Tomorrow: ${b.registration} with ${memberName} at ${clock(b.startsAt, club.timeZone)}`, template: "booking-reminder",
              payload: { clubName: club.name, personName: instructorName!, when, registration: b.registration, withWhom: `You teach ${memberName}`, url },
            });
            messages++;
          }
          recordReminder(tx, { clubId: club.id, bookingId: b.id, startsAt: b.startsAt, outboxId: first });
          bookings++;
        }
        return { bookings, messages };
      },
      { behavior: "immediate" },
    );
    result.bookings += counts.bookings;
    result.messages += counts.messages;
  }
  return result;
}
