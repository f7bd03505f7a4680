// Booking guards: what stands against a booking, each refused or only warned as the club's
// settings decide (settings.bookingGuards), always with the reason in plain words. The pilot's
// last days come from the currency board's own computation (lib/currency through
// db/queries/currency), so a member is never current on one screen and not on another.
//
// With an instructor on the booking the instructor is pilot in command, so the member's own
// checkout, currency and medical do not stop it (that is how a member gets checked out or
// current again). The aircraft and the member's account are checked either way.

import type { AircraftStatusResult, StatusReason } from "@/lib/airworthiness";
import { compareIsoDates, type IsoDate } from "@/lib/dates";
import { defaultClubSettings, type ClubSettings } from "@/lib/validation/club-settings";

// A club whose stored settings predate a guard uses that guard's default (flightReview: refuse).
const DEFAULT_GUARDS = defaultClubSettings().bookingGuards;

export type GuardKey = keyof ClubSettings["bookingGuards"];
/**
 * "statusUnknown" is never a refusal: missing records are said out loud, never read as flyable.
 * "limitations" is never a refusal either: a deferred item with a limitation (14 CFR
 * 91.213(d)) leaves the aircraft flyable within it, which only the pilot can judge for the
 * flight; the pilot reads each limitation when booking and ticks it again when the flight begins.
 */
export type GuardFinding = { guard: GuardKey | "statusUnknown" | "limitations"; reason: string };
export type GuardOutcome = { refusals: GuardFinding[]; warnings: GuardFinding[] };

export type GuardInput = {
  /** The booking's first and last calendar day in the club's time zone. */
  window: { startDate: IsoDate; endDate: IsoDate };
  aircraft: {
    registration: string;
    typeGroup: string;
    /** The status now, as the flight line computes it. */
    statusNow: AircraftStatusResult;
    /**
     * The status at the end of the booking: the end date as "today", notices effective by then,
     * and the meter projected at the club's average flight length. Null when it cannot be
     * computed (then the booking is warned "Status unknown").
     */
    statusAtEnd: AircraftStatusResult | null;
    /** Average flight length used for the projection, in hours, for the reason text. */
    averageFlightHours: number;
  };
  /**
   * Whether the booking touches night as 14 CFR 61.57(b) counts it: from one hour after sunset
   * to one hour before sunrise at the club's home field. Computed outside (lib/bookings/night).
   */
  nightFlight: boolean;
  /**
   * Set when night could not be computed (the club's position is not recorded). The loader then
   * sets `nightFlight` to true when passengers are planned, and the reason says why.
   */
  nightUnknown?: boolean;
  /**
   * The member's standing, as the currency board computes it (db/queries/currency →
   * lib/currency): each is the last day on which it still holds, or null when not on record.
   */
  member: {
    name: string;
    checkedOut: boolean;
    recencyLastDay: IsoDate | null;
    flightReviewLastDay: IsoDate | null;
    medicalLastDay: IsoDate | null;
    passengerDayLastDay: IsoDate | null;
    /** 14 CFR 61.57(b), in the booked aircraft's category and class; verified records only. */
    passengerNightLastDay: IsoDate | null;
    arrears: { inArrears: boolean; owedText: string; oldestDueDate: IsoDate | null } | null;
  };
  withInstructor: boolean;
  carryingPassengers: boolean;
};

const GROUNDING_NOTICE_CODES = new Set(["notice-active"]);
/** Reasons that leave the aircraft "flyable with limits" (lib/airworthiness). */
const LIMITATION_CODES = new Set(["deferred-item", "ifr-test-overdue"]);
const ITEM_CODES = new Set(["inspection-overdue"]);

function groundingTexts(reasons: StatusReason[]): string[] {
  return reasons.filter((r) => r.grounding).map((r) => r.text);
}

function aircraftFindings(input: GuardInput): GuardFinding[] {
  const { aircraft } = input;
  const reg = aircraft.registration;
  const out: GuardFinding[] = [];
  if (aircraft.statusNow.status === "grounded") {
    out.push({ guard: "grounded", reason: `${reg} is grounded: ${groundingTexts(aircraft.statusNow.reasons).join("; ")}.` });
    return out;
  }
  if (aircraft.statusNow.status === "unknown") {
    const texts = aircraft.statusNow.reasons.filter((r) => !r.grounding).map((r) => r.text);
    out.push({ guard: "statusUnknown", reason: `Status unknown: ${reg} is missing a record its status needs (${texts.join("; ") || "record not named"}).` });
  }
  const atEnd = aircraft.statusAtEnd;
  if (!atEnd) {
    out.push({ guard: "statusUnknown", reason: `Status unknown: ${reg} is missing a record needed to tell whether anything comes due before this booking ends.` });
    return out;
  }
  const nowTexts = new Set(aircraft.statusNow.reasons.map((r) => r.text));
  const fresh = atEnd.reasons.filter((r) => r.grounding && !nowTexts.has(r.text));
  const notices = fresh.filter((r) => GROUNDING_NOTICE_CODES.has(r.code));
  const items = fresh.filter((r) => ITEM_CODES.has(r.code));
  const other = fresh.filter((r) => !GROUNDING_NOTICE_CODES.has(r.code) && !ITEM_CODES.has(r.code));
  if (notices.length || other.length) {
    out.push({ guard: "grounded", reason: `${reg} will be grounded before this booking ends: ${[...notices, ...other].map((r) => r.text).join("; ")}.` });
  }
  if (items.length) {
    const hours = aircraft.averageFlightHours.toFixed(1);
    out.push({
      guard: "inspectionDue",
      reason: `${reg} comes due inside this booking (counting ${hours} h per booked flight, the average flight length): ${items.map((r) => r.text).join("; ")}.`,
    });
  }
  return out;
}

/**
 * The limitations an aircraft flies under ("flyable with limits"), as the flight line words
 * them: deferred items with their limitation (14 CFR 91.213(d)) and lapsed IFR-only checks.
 * Booking quotes them; beginning the flight shows them again and needs the pilot's tick.
 */
export function limitationTexts(reasons: readonly StatusReason[]): string[] {
  const texts: string[] = [];
  for (const r of reasons) if (!r.grounding && LIMITATION_CODES.has(r.code) && !texts.includes(r.text)) texts.push(r.text);
  return texts;
}

/** Each limitation now or by the end of the booking, quoted as the flight line words it. */
function limitationFindings(input: GuardInput): GuardFinding[] {
  const { aircraft } = input;
  if (aircraft.statusNow.status === "grounded") return [];
  const texts = limitationTexts([...aircraft.statusNow.reasons, ...(aircraft.statusAtEnd?.reasons ?? [])]);
  if (!texts.length) return [];
  return [{ guard: "limitations", reason: `${aircraft.registration} is flyable with limits. ${texts.map((t) => `“${t}”`).join(" ")} Plan this flight within each limitation; you will be asked again when the flight begins.` }];
}

/** Lapsed when there is no last day, or it falls before the booking's last day. */
function lapses(lastDay: IsoDate | null, endDate: IsoDate): boolean {
  return lastDay === null || compareIsoDates(lastDay, endDate) < 0;
}

function memberFindings(input: GuardInput, settings: Pick<ClubSettings, "recencyDaysInType">): GuardFinding[] {
  const { member, aircraft, window } = input;
  const out: GuardFinding[] = [];
  if (!input.withInstructor) {
    if (!member.checkedOut) {
      out.push({ guard: "notCheckedOut", reason: `${member.name} is not checked out in the ${aircraft.typeGroup}: book with an instructor, or ask one for a checkout.` });
    }
    // 14 CFR 61.56(c): without a flight review in the preceding 24 calendar months the pilot
    // may not act as pilot in command at all, so this is its own guard, refused by default.
    if (member.flightReviewLastDay === null) {
      out.push({ guard: "flightReview", reason: `${member.name} may not act as pilot in command: no verified flight review on record (14 CFR 61.56(c)). Book with an instructor, or have an instructor verify your flight review.` });
    } else if (lapses(member.flightReviewLastDay, window.endDate)) {
      out.push({ guard: "flightReview", reason: `${member.name} may not act as pilot in command after ${member.flightReviewLastDay}: the flight review expires before the booking ends (14 CFR 61.56(c)). Book with an instructor for a flight review.` });
    }
    const current: string[] = [];
    if (member.checkedOut && lapses(member.recencyLastDay, window.endDate)) {
      current.push(
        member.recencyLastDay
          ? `the club's rule of a flight in the ${aircraft.typeGroup} within ${settings.recencyDaysInType} days expires after ${member.recencyLastDay}`
          : `no flight in the ${aircraft.typeGroup} on record within the club's ${settings.recencyDaysInType} days`,
      );
    }
    if (input.carryingPassengers && lapses(member.passengerDayLastDay, window.endDate)) {
      current.push("not 3 takeoffs and landings within the preceding 90 days to carry passengers through the booking (14 CFR 61.57(a))");
    }
    if (current.length) out.push({ guard: "notCurrent", reason: `${member.name} is not current: ${current.join("; ")}.` });
    if (input.carryingPassengers && input.nightFlight && lapses(member.passengerNightLastDay, window.endDate)) {
      const why = input.nightUnknown
        ? "Night unknown (missing record: the club's home field position), so this booking is treated as touching night"
        : "This booking touches night (from one hour after sunset to one hour before sunrise at the home field)";
      const standing = member.passengerNightLastDay
        ? `night passenger currency expires after ${member.passengerNightLastDay}`
        : "no 3 full-stop night landings within the preceding 90 days on record";
      out.push({ guard: "notCurrent", reason: `${why}: ${member.name} may not carry passengers then: ${standing} (14 CFR 61.57(b)).` });
    }
    if (member.medicalLastDay === null) {
      out.push({ guard: "medicalExpired", reason: `${member.name} has no medical certificate on record (14 CFR 61.23).` });
    } else if (lapses(member.medicalLastDay, window.endDate)) {
      out.push({ guard: "medicalExpired", reason: `${member.name}'s medical certificate expires after ${member.medicalLastDay}, before the booking ends (14 CFR 61.23).` });
    }
  }
  if (member.arrears?.inArrears) {
    const since = member.arrears.oldestDueDate ? `, unpaid since ${member.arrears.oldestDueDate}` : "";
    out.push({ guard: "inArrears", reason: `${member.name}'s account is overdue: ${member.arrears.owedText} owed${since}.` });
  }
  return out;
}

/** Every finding, sorted into refusals and warnings by the club's setting for its guard. */
export function evaluateBookingGuards(input: GuardInput, settings: Pick<ClubSettings, "bookingGuards" | "recencyDaysInType">): GuardOutcome {
  const findings = [...aircraftFindings(input), ...limitationFindings(input), ...memberFindings(input, settings)];
  const refusals: GuardFinding[] = [];
  const warnings: GuardFinding[] = [];
  for (const f of findings) {
    if (f.guard !== "statusUnknown" && f.guard !== "limitations" && (settings.bookingGuards[f.guard] ?? DEFAULT_GUARDS[f.guard]) === "refuse") refusals.push(f);
    else warnings.push(f);
  }
  return { refusals, warnings };
}

/** Whether the warnings a member accepted are still the ones that apply (same reasons). */
export function warningsAccepted(warnings: readonly GuardFinding[], accepted: readonly string[]): boolean {
  const set = new Set(accepted);
  return warnings.every((w) => set.has(w.guard));
}
