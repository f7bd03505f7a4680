"use server";
import { clubAction } from "@/lib/actions/create-action";
import { cancelSeriesSchema } from "@/lib/validation/bookings";
import { cancelSeriesInTx, type SeriesCancelResult } from "./booking-series";

function weeks(n: number): string {
  return `${n} week${n === 1 ? "" : "s"}`;
}

/** Cancels this week of a weekly series and every later week still booked (each checked on its own). */
export const cancelBookingSeries = clubAction({
  schema: cancelSeriesSchema,
  permission: ["create", "Booking"],
  success: "Weeks cancelled.",
  name: "booking.series.cancel",
  run(tx, ctx, input) {
    const done = cancelSeriesInTx(tx, ctx, input.bookingId, input.reason);
    const left = done.refused.length ? ` Left as they were: ${done.refused.map((r) => `${r.when} — ${r.reason}`).join(" ")}` : "";
    if (!done.cancelled.length) return { message: `Nothing to cancel: no week from this one on is still booked and yet to start.${left}`, data: done as SeriesCancelResult };
    const late = done.cancelled.filter((c) => c.late).map((c) => `${c.when}: ${c.late}`);
    return {
      message: `Cancelled ${weeks(done.cancelled.length)}: ${done.cancelled.map((c) => c.when).join("; ")}. The aircraft is free again on those days.${late.length ? ` ${late.join(" ")}` : ""}${left}`,
      data: done as SeriesCancelResult,
      refresh: true,
    };
  },
});
