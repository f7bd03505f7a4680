"use server";
import { getWeightBalanceProfile, saveBookingLoading, toLoadingProfile } from "@/db/queries/tools-wb";
import { loadBookingForParty } from "@/lib/actions/bookings/booking-access";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { computeLoading } from "@/lib/bookings/loading";
import { loadingSchema } from "@/lib/validation/tools";

// The member's weight and balance for a booking, computed on the server from the aircraft's
// profile and saved with the booking (the latest one counts).
export const saveLoading = clubAction({
  schema: loadingSchema,
  permission: ["read", "Tools"],
  success: "Weight and balance saved with the booking.",
  run(tx, ctx, input) {
    const { club, user } = ctx;
    const booking = loadBookingForParty(tx, ctx, input.bookingId);
    if (booking.status === "cancelled" || booking.status === "checked_in") throw new ActionError(`This booking is ${booking.status === "cancelled" ? "cancelled" : "flown and its flight sheet closed"}; its weight and balance is kept as it was.`, {}, "conflict");
    const profile = getWeightBalanceProfile(tx, club.id, booking.aircraftId);
    if (!profile) throw new ActionError("This aircraft has no weight and balance figures yet; ask maintenance to enter them.", {}, "not_found");
    const stationWeights: Record<string, number> = {};
    input.stationKey.forEach((k, i) => (stationWeights[k] = input.stationWeight[i] ?? 0));
    const fuelVolumes: Record<string, number> = {};
    input.tankKey.forEach((k, i) => (fuelVolumes[k] = input.tankVolume[i] ?? 0));
    const unknown = [...Object.keys(stationWeights).filter((k) => !profile.stations.some((s) => s.key === k)), ...Object.keys(fuelVolumes).filter((k) => !profile.tanks.some((t) => t.key === k))];
    if (unknown.length) throw new ActionError("The aircraft's figures changed while you were typing; reload the page and enter the loading again.", {}, "conflict");
    const result = computeLoading(toLoadingProfile(profile), { category: input.category, stationWeights, fuelVolumes, burnVolume: input.burnVolume }, ctx.club.locale);
    const point = (p: typeof result.takeoff) => ({ weight: p.weight, moment: p.moment, cg: p.cg, withinEnvelope: p.withinEnvelope, overweight: p.overweight });
    saveBookingLoading(tx, club.id, booking.id, {
      profileId: profile.id,
      category: input.category,
      stationWeights,
      fuelVolumes,
      burnVolume: input.burnVolume,
      takeoff: point(result.takeoff),
      landing: point(result.landing),
      problems: result.problems,
      savedById: user.id,
    });
    return {
      message: result.problems.length ? `Saved, but out of limits: ${result.problems.join(" ")}` : "Saved: within the envelope and every limit at takeoff and at landing.",
      data: { problems: result.problems },
      refresh: true,
    };
  },
});
