import { canAll, type AppAbility, type SubjectName } from "@/permissions";

// The warnings a member read and accepted when booking name their own standing ("no medical
// certificate on record", "in arrears: $N owed"). They are shown to the booking's member, the
// instructor on that booking, and otherwise only warning by warning to roles that read that
// kind of data for every member (the safety officer and admins for currency and medical, the
// treasurer and admins for arrears). Everyone else gets the booking without them.

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
  if (booking.userId === viewerId || (booking.instructorId !== null && booking.instructorId === viewerId)) return [...booking.acceptedWarnings];
  return booking.acceptedWarnings.filter((w) => canAll(ability, "read", warningSubject(w.guard)));
}
