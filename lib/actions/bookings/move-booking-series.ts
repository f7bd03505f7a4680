"use server";
import { clubAction } from "@/lib/actions/create-action";
import { moveSeriesSchema } from "@/lib/validation/bookings";
import { moveSeriesInTx, type SeriesMoveResult } from "./booking-series";

function weeks(n: number): string {
  return `${n} week${n === 1 ? "" : "s"}`;
}

/** Gives this week of a weekly series and every later one new times of day, week by week through the change path. */
export const moveBookingSeries = clubAction({
  schema: moveSeriesSchema,
  permission: ["create", "Booking"],
  success: "Weeks moved.",
  name: "booking.series.move",
  run(tx, ctx, input) {
    const done = moveSeriesInTx(tx, ctx, input);
    const refused = done.refused.length ? ` Not moved (left as they were): ${done.refused.map((r) => `${r.when} — ${r.reason}`).join(" ")}` : "";
    if (!done.moved.length) return { message: `Nothing to move: no week from this one on is still booked and yet to start.${refused}`, data: done as SeriesMoveResult };
    const late = done.moved.filter((m) => m.late).map((m) => `${m.when}: ${m.late}`);
    return {
      message: `Moved ${weeks(done.moved.length)} to ${done.times} club time: ${done.moved.map((m) => m.when).join("; ")}.${late.length ? ` ${late.join(" ")}` : ""}${refused}`,
      data: done as SeriesMoveResult,
      refresh: true,
    };
  },
});
