import { describe, expect, it } from "vitest";
import { evaluateBookingGuards, warningsAccepted, type GuardInput } from "@/lib/bookings/guards";
import { defaultClubSettings } from "@/lib/validation/club-settings";

// Night passenger currency, the flight review refusal and the aircraft's limitations.

const flyable = { status: "flyable" as const, reasons: [] };
const settings = defaultClubSettings();

function input(over: { aircraft?: Partial<GuardInput["aircraft"]>; member?: Partial<GuardInput["member"]>; withInstructor?: boolean; carryingPassengers?: boolean; nightFlight?: boolean; nightUnknown?: boolean } = {}): GuardInput {
  return {
    window: { startDate: "2026-05-10", endDate: "2026-05-10" },
    aircraft: { registration: "N0123X", typeGroup: "Fernwhistle F160", statusNow: flyable, statusAtEnd: flyable, averageFlightHours: 1.2, ...over.aircraft },
    member: {
      name: "Test Pilot", checkedOut: true, recencyLastDay: "2026-06-30", flightReviewLastDay: "2027-03-31", medicalLastDay: "2028-01-31",
      passengerDayLastDay: "2026-07-01", passengerNightLastDay: "2026-07-01", arrears: null, ...over.member,
    },
    withInstructor: over.withInstructor ?? false,
    carryingPassengers: over.carryingPassengers ?? false,
    nightFlight: over.nightFlight ?? false,
    ...(over.nightUnknown ? { nightUnknown: true } : {}),
  };
}

describe("night passenger currency (14 CFR 61.57(b))", () => {
  it("with passengers at night, lapsed night currency is a finding citing 61.57(b)", () => {
    const out = evaluateBookingGuards(input({ carryingPassengers: true, nightFlight: true, member: { passengerNightLastDay: "2026-05-09" } }), settings);
    const night = [...out.refusals, ...out.warnings].filter((f) => f.reason.includes("14 CFR 61.57(b)"));
    expect(night).toHaveLength(1); // 14 CFR 61.57(b): lapsed the day before the booking
    expect(night[0]!.reason).toContain("night passenger currency expires after 2026-05-09");
  });

  it("no night landings on record at all is the same finding", () => {
    const out = evaluateBookingGuards(input({ carryingPassengers: true, nightFlight: true, member: { passengerNightLastDay: null } }), settings);
    expect(out.warnings.some((f) => f.reason.includes("14 CFR 61.57(b)"))).toBe(true); // 14 CFR 61.57(b): three full stops at night needed
  });

  it("still current on the booking's last day: nothing (the day itself counts)", () => {
    expect(evaluateBookingGuards(input({ carryingPassengers: true, nightFlight: true, member: { passengerNightLastDay: "2026-05-10" } }), settings)).toEqual({ refusals: [], warnings: [] }); // 14 CFR 61.57(b), day 1 convention
  });

  it("by day, or without passengers, or with an instructor as pilot in command: not weighed", () => {
    const member = { passengerNightLastDay: null };
    expect(evaluateBookingGuards(input({ carryingPassengers: true, nightFlight: false, member }), settings)).toEqual({ refusals: [], warnings: [] }); // 14 CFR 61.57(b) applies at night only
    expect(evaluateBookingGuards(input({ carryingPassengers: false, nightFlight: true, member }), settings)).toEqual({ refusals: [], warnings: [] }); // 14 CFR 61.57(b): carrying passengers only
    expect(evaluateBookingGuards(input({ carryingPassengers: true, nightFlight: true, withInstructor: true, member }), settings)).toEqual({ refusals: [], warnings: [] }); // common practice: the instructor is pilot in command
  });

  it("when night could not be computed the reason says so", () => {
    const out = evaluateBookingGuards(input({ carryingPassengers: true, nightFlight: true, nightUnknown: true, member: { passengerNightLastDay: null } }), settings);
    expect(out.warnings[0]!.reason).toMatch(/^Night unknown .* treated as touching night: .*\(14 CFR 61\.57\(b\)\)\.$/); // 14 CFR 61.57(b)
  });
});

describe("flight review (14 CFR 61.56(c))", () => {
  it("has its own guard, refused by default, worded as a refusal to act as pilot in command", () => {
    expect(settings.bookingGuards.flightReview).toBe("refuse"); // 14 CFR 61.56(c): may not act as PIC without it
    const out = evaluateBookingGuards(input({ member: { flightReviewLastDay: null } }), settings);
    expect(out.refusals).toEqual([{ guard: "flightReview", reason: "Test Pilot may not act as pilot in command: no verified flight review on record (14 CFR 61.56(c)). Book with an instructor, or have an instructor verify your flight review." }]);
    expect(out.refusals[0]!.reason).not.toMatch(/not current/);
  });

  it("a review running out on the booking's last day still covers it; the day before does not", () => {
    // 14 CFR 61.56(c): valid through the end of the 24th calendar month; lastDay is that day.
    expect(evaluateBookingGuards(input({ member: { flightReviewLastDay: "2026-05-10" } }), settings).refusals).toEqual([]);
    expect(evaluateBookingGuards(input({ member: { flightReviewLastDay: "2026-05-09" } }), settings).refusals.map((r) => r.guard)).toEqual(["flightReview"]);
  });

  it("an instructor aboard is pilot in command: no refusal; a club may choose to only warn", () => {
    expect(evaluateBookingGuards(input({ member: { flightReviewLastDay: null }, withInstructor: true }), settings)).toEqual({ refusals: [], warnings: [] }); // 14 CFR 61.56(c): the PIC needs the review
    const warnOnly = { ...settings, bookingGuards: { ...settings.bookingGuards, flightReview: "warn" as const } };
    expect(evaluateBookingGuards(input({ member: { flightReviewLastDay: null } }), warnOnly).warnings.map((w) => w.guard)).toEqual(["flightReview"]);
  });

  it("a club whose stored settings predate the guard refuses (the default)", () => {
    const { flightReview: _omit, ...older } = settings.bookingGuards;
    const stale = { ...settings, bookingGuards: older as typeof settings.bookingGuards };
    expect(evaluateBookingGuards(input({ member: { flightReviewLastDay: null } }), stale).refusals.map((r) => r.guard)).toEqual(["flightReview"]); // 14 CFR 61.56(c)
  });
});

describe("flyable with limits (14 CFR 91.213(d))", () => {
  const limited = {
    status: "limited" as const,
    reasons: [
      { code: "deferred-item", text: "Deferred, placarded inoperative (14 CFR 91.213(d)): landing light. Limitation: No night flight", grounding: false },
      { code: "deferred-item", text: "Deferred, placarded inoperative (14 CFR 91.213(d)): right fuel gauge. Limitation: Dip the right tank before flight", grounding: false },
      { code: "due-soon", text: "Annual due soon", grounding: false },
    ],
  };

  it("a warning quotes each limitation's text and is never a refusal", () => {
    const out = evaluateBookingGuards(input({ aircraft: { statusNow: limited, statusAtEnd: limited } }), settings);
    expect(out.refusals).toEqual([]);
    expect(out.warnings).toHaveLength(1);
    expect(out.warnings[0]!.guard).toBe("limitations");
    expect(out.warnings[0]!.reason).toContain("“Deferred, placarded inoperative (14 CFR 91.213(d)): landing light. Limitation: No night flight”"); // 14 CFR 91.213(d)(3): operate within the placarded limitation
    expect(out.warnings[0]!.reason).toContain("Limitation: Dip the right tank before flight");
    expect(out.warnings[0]!.reason).not.toContain("Annual due soon");
    expect(warningsAccepted(out.warnings, [])).toBe(false);
    expect(warningsAccepted(out.warnings, ["limitations"])).toBe(true);
  });

  it("an instructor aboard changes nothing: the limitation belongs to the aircraft", () => {
    expect(evaluateBookingGuards(input({ withInstructor: true, aircraft: { statusNow: limited, statusAtEnd: limited } }), settings).warnings.map((w) => w.guard)).toEqual(["limitations"]); // 14 CFR 91.213(d)
  });

  it("a limitation arising before the end of the booking is quoted too", () => {
    const atEnd = { status: "limited" as const, reasons: [{ code: "ifr-test-overdue", text: "Altimeter and static test overdue: no IFR flight until it is done", grounding: false }] };
    expect(evaluateBookingGuards(input({ aircraft: { statusAtEnd: atEnd } }), settings).warnings[0]!.reason).toContain("no IFR flight until it is done"); // 14 CFR 91.411
  });
});
