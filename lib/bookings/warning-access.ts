import { canAll, type AppAbility, type SubjectName } from "@/permissions";

// The warnings a member read and accepted when booking name their own standing ("no medical
// certificate on record", "in arrears: $N owed"). They are shown to the booking's member; to the
// instructor on that booking only the ones about flying (currency, medical, the aircraft's
// limitations: they fly it with the member), never the member's money; and otherwise only warning
// by warning to roles that read that kind of data for every member (the safety officer and admins
// for currency and medical, the treasurer and admins for arrears). Everyone else gets the booking
// without them.

type Warning = { guard: string; reason: string };

/** Whose data a warning carries: the member's account for arrears, their currency for the rest. */
export function warningSubject(guard: string): SubjectName {
  return guard === "inArrears" ? "Account" : "Currency";
}

export function visibleBookingWarnings<W extends Warning>(
  ability: AppAbility,
  viewerId: string,
  booking: { userId: string; instructorId: string | null; acceptedWarnings: readonly W[] },
): W[] {
  if (booking.userId === viewerId) return [...booking.acceptedWarnings];
  const instructorOnIt = booking.instructorId !== null && booking.instructorId === viewerId;
  return booking.acceptedWarnings.filter((w) => (instructorOnIt && warningSubject(w.guard) !== "Account") || canAll(ability, "read", warningSubject(w.guard)));
}
