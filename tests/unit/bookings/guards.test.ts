import { describe, expect, it } from "vitest";
import { evaluateBookingGuards, warningsAccepted, type GuardInput } from "@/lib/bookings/guards";
import { defaultClubSettings } from "@/lib/validation/club-settings";

const flyable = { status: "flyable" as const, reasons: [] };

function input(over: { aircraft?: Partial<GuardInput["aircraft"]>; member?: Partial<GuardInput["member"]>; withInstructor?: boolean; carryingPassengers?: boolean; nightFlight?: boolean } = {}): GuardInput {
  return {
    window: { startDate: "2026-05-10", endDate: "2026-05-10" },
    aircraft: { registration: "N0123X", typeGroup: "Fernwhistle F160", statusNow: flyable, statusAtEnd: flyable, averageFlightHours: 1.2, ...over.aircraft },
    member: {
      name: "Test Pilot", checkedOut: true, recencyLastDay: "2026-06-30", flightReviewLastDay: "2027-03-31", medicalLastDay: "2028-01-31", passengerDayLastDay: "2026-07-01", passengerNightLastDay: "2026-07-01",
      arrears: { inArrears: false, owedText: "$0.00", oldestDueDate: null }, ...over.member,
    },
    withInstructor: over.withInstructor ?? false,
    carryingPassengers: over.carryingPassengers ?? false,
    nightFlight: over.nightFlight ?? false,
  };
}

const settings = defaultClubSettings();
const guardsOf = (o: ReturnType<typeof evaluateBookingGuards>) => ({ refusals: o.refusals.map((f) => f.guard), warnings: o.warnings.map((f) => f.guard) });

describe("evaluateBookingGuards", () => {
  it("nothing against a pilot in order on a flyable aircraft", () => {
    expect(evaluateBookingGuards(input(), settings)).toEqual({ refusals: [], warnings: [] });
  });

  it("grounded now: the grounding reasons are the reason; the club setting decides refuse or warn", () => {
    const grounded = { status: "grounded" as const, reasons: [{ code: "squawk-grounding", text: "Grounding squawk: brake fades", grounding: true }, { code: "due-soon", text: "Annual due soon", grounding: false }] };
    const out = evaluateBookingGuards(input({ aircraft: { statusNow: grounded, statusAtEnd: grounded } }), settings);
    expect(out.refusals).toEqual([{ guard: "grounded", reason: "N0123X is grounded: Grounding squawk: brake fades." }]);
    const warn = evaluateBookingGuards(input({ aircraft: { statusNow: grounded, statusAtEnd: grounded } }), { ...settings, bookingGuards: { ...settings.bookingGuards, grounded: "warn" } });
    expect(guardsOf(warn)).toEqual({ refusals: [], warnings: ["grounded"] });
  });

  it("an item overdue by the end of the booking is 'inspection due', with the average flight length named", () => {
    const atEnd = { status: "grounded" as const, reasons: [{ code: "inspection-overdue", text: "100-hour inspection overdue: due at 1200.0 h", grounding: true }] };
    const out = evaluateBookingGuards(input({ aircraft: { statusAtEnd: atEnd } }), settings);
    expect(out.refusals[0]).toEqual({ guard: "inspectionDue", reason: "N0123X comes due inside this booking (counting 1.2 h per booked flight, the average flight length): 100-hour inspection overdue: due at 1200.0 h." });
  });

  it("a grounding notice taking effect before the end is 'grounded'", () => {
    const atEnd = { status: "grounded" as const, reasons: [{ code: "notice-active", text: "Grounding notice in effect since 2026-05-10T12:00:00Z: engine check", grounding: true }] };
    expect(guardsOf(evaluateBookingGuards(input({ aircraft: { statusAtEnd: atEnd } }), settings))).toEqual({ refusals: ["grounded"], warnings: [] });
  });

  it("a status that cannot be computed is always a warning ('Status unknown'), never flyable and never silent", () => {
    const unknown = { status: "unknown" as const, reasons: [{ code: "no-completion", text: "Annual inspection: no completion on record", grounding: false }] };
    const out = evaluateBookingGuards(input({ aircraft: { statusNow: unknown, statusAtEnd: unknown } }), settings);
    expect(out.warnings).toEqual([{ guard: "statusUnknown", reason: "Status unknown: N0123X is missing a record its status needs (Annual inspection: no completion on record)." }]);
    expect(guardsOf(evaluateBookingGuards(input({ aircraft: { statusAtEnd: null } }), settings)).warnings).toEqual(["statusUnknown"]);
  });

  it("not checked out is refused by default; an instructor aboard waives checkout, currency and medical", () => {
    const member = { checkedOut: false, flightReviewLastDay: null, medicalLastDay: null };
    // 14 CFR 61.56(c): no flight review is its own refusal (guard flightReview, default "refuse").
    expect(guardsOf(evaluateBookingGuards(input({ member }), settings))).toEqual({ refusals: ["notCheckedOut", "flightReview", "medicalExpired"], warnings: [] });
    expect(evaluateBookingGuards(input({ member, withInstructor: true }), settings)).toEqual({ refusals: [], warnings: [] });
  });

  it("currency lapsing before the booking's last day counts (flight review 14 CFR 61.56(c), club recency)", () => {
    const out = evaluateBookingGuards(input({ member: { flightReviewLastDay: "2026-05-09", recencyLastDay: null } }), settings);
    expect(out.warnings).toEqual([{ guard: "notCurrent", reason: "Test Pilot is not current: no flight in the Fernwhistle F160 on record within the club's 90 days." }]);
    // 14 CFR 61.56(c): the review ran out the day before the booking: refused, not "not current".
    expect(out.refusals).toEqual([{ guard: "flightReview", reason: "Test Pilot may not act as pilot in command after 2026-05-09: the flight review expires before the booking ends (14 CFR 61.56(c)). Book with an instructor for a flight review." }]);
    // Still good on its last day (the day itself counts).
    expect(evaluateBookingGuards(input({ member: { flightReviewLastDay: "2026-05-10", recencyLastDay: "2026-05-10" } }), settings)).toEqual({ refusals: [], warnings: [] });
  });

  it("passenger currency (14 CFR 61.57(a)) is weighed only when passengers are planned", () => {
    const member = { passengerDayLastDay: "2026-05-01" };
    expect(evaluateBookingGuards(input({ member }), settings).warnings).toEqual([]);
    expect(evaluateBookingGuards(input({ member, carryingPassengers: true }), settings).warnings[0]?.reason).toMatch(/3 takeoffs and landings within the preceding 90 days/);
  });

  it("an expired medical names its last day (14 CFR 61.23)", () => {
    expect(evaluateBookingGuards(input({ member: { medicalLastDay: "2026-04-30" } }), settings).refusals).toEqual([
      { guard: "medicalExpired", reason: "Test Pilot's medical certificate expires after 2026-04-30, before the booking ends (14 CFR 61.23)." },
    ]);
  });

  it("arrears apply with or without an instructor, warned by default", () => {
    const member = { arrears: { inArrears: true, owedText: "$212.40", oldestDueDate: "2026-03-01" } };
    const out = evaluateBookingGuards(input({ member, withInstructor: true }), settings);
    expect(out.warnings).toEqual([{ guard: "inArrears", reason: "Test Pilot's account is overdue: $212.40 owed, unpaid since 2026-03-01." }]);
  });
});

describe("warningsAccepted", () => {
  it("every warning's guard must have been ticked", () => {
    const w = [{ guard: "notCurrent" as const, reason: "x" }, { guard: "inArrears" as const, reason: "y" }];
    expect(warningsAccepted(w, ["notCurrent"])).toBe(false);
    expect(warningsAccepted(w, ["inArrears", "notCurrent"])).toBe(true);
    expect(warningsAccepted([], [])).toBe(true);
  });
});
