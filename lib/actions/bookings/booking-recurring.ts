import "server-only";
import type { Tx } from "@/db/client";
import { newId } from "@/db/schema/columns";
import { ActionError } from "@/lib/actions/action-state";
import { describeLocalWindow, expandWeekly } from "@/lib/bookings/recurrence";
import type { ClubContext } from "@/lib/server/club-context";
import type { CreateBookingInput } from "@/lib/validation/bookings";
import { createBookingInTx } from "./booking-core";

// A weekly booking: each week's window goes through the one booking path (createBookingInTx:
// overlap, maintenance blocks, the instructor's times, the aircraft and member guards), inside
// the action's one transaction. Weeks that are refused are listed with their reason; the others
// are booked. Warnings still to be read stop the whole submission (nothing written) so that the
// member reads them once for every week.

type Ctx = Pick<ClubContext, "club" | "user" | "ability">;

export type Occurrence = { startsAt: string; endsAt: string; when: string };
export type RecurringResult = {
  booked: (Occurrence & { bookingId: string })[];
  refused: (Occurrence & { reason: string })[];
  registration: string;
  memberId: string;
  acceptedWarnings: number;
};

/** The words of a refusal, without the warnings still to be read. */
export function reasonOf(error: ActionError): string {
  const fields = Object.entries(error.fieldErrors).filter(([k]) => k !== "warnings" && k !== "warningGuards" && k !== "refusals");
  const texts = [...(error.fieldErrors.refusals ?? []), ...fields.flatMap(([, v]) => v)];
  const unique = [...new Set(texts)];
  return unique.length ? unique.join(" ") : error.message.replace(/^Not booked: /, "");
}

export function createRecurringInTx(tx: Tx, ctx: Ctx, input: CreateBookingInput, now: Date = new Date()): RecurringResult {
  const result: RecurringResult = { booked: [], refused: [], registration: "", memberId: input.memberId ?? ctx.user.id, acceptedWarnings: 0 };
  const warnings = new Map<string, string>();
  // The weeks booked by this one submission share a series id, so the later ones can be
  // cancelled or moved together from any week's page.
  const seriesId = newId();
  for (const week of expandWeekly({ startsAt: input.startsAt, endsAt: input.endsAt }, input.repeatWeeks)) {
    const when = describeLocalWindow(week);
    try {
      const made = createBookingInTx(tx, ctx, { ...input, ...week, repeatWeeks: 1 }, now, { seriesId });
      result.registration = made.plane.registration;
      result.acceptedWarnings += made.acceptedWarnings.length;
      result.booked.push({ ...week, when, bookingId: made.bookingId });
    } catch (error) {
      if (!(error instanceof ActionError)) throw error;
      // Only the member and aircraft being wrong for every week stops here: a person who may not
      // book for that member, or an aircraft not of this club.
      if (error.code === "forbidden" || error.code === "not_found") throw error;
      const pending = error.fieldErrors.warnings ?? [];
      if (pending.length && !(error.fieldErrors.refusals ?? []).length) {
        const guards = error.fieldErrors.warningGuards ?? [];
        pending.forEach((w, i) => warnings.set(guards[i] ?? w, w));
        continue;
      }
      result.refused.push({ ...week, when, reason: reasonOf(error) });
    }
  }
  if (warnings.size) {
    const refusedNote = result.refused.length ? ` ${result.refused.length} of the ${input.repeatWeeks} weeks cannot be booked: ${result.refused.map((r) => `${r.when} — ${r.reason}`).join(" ")}` : "";
    throw new ActionError(`Read the warnings below. Tick that you have read them to book every week anyway.${refusedNote}`, { warnings: [...warnings.values()], warningGuards: [...warnings.keys()] });
  }
  if (!result.booked.length) {
    throw new ActionError(`Nothing booked: none of the ${input.repeatWeeks} weeks is free. ${result.refused.map((r) => `${r.when} — ${r.reason}`).join(" ")}`, { startsAt: result.refused.map((r) => `${r.when}: ${r.reason}`) }, "conflict");
  }
  return result;
}
