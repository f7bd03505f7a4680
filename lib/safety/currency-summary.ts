import { documentExpiryStatus, flightReviewDue, passengerCurrency, recencyInType, type LandingEntry } from "@/lib/currency";
import { compareIsoDates, daysBetween, type IsoDate } from "@/lib/dates";
import { normalizeTypeGroup } from "./audience";

export type CurrencyState = "current" | "expiring" | "expired" | "missing";

export const CURRENCY_STATE_LABELS: Record<CurrencyState, string> = {
  current: "Current",
  expiring: "Ends soon",
  expired: "Lapsed",
  missing: "Not on record",
};

export type CurrencyItem = { key: string; label: string; state: CurrencyState; lastDay: IsoDate | null };

export type CurrencyInput = {
  /** Club flights and outside-flight entries alike, each with its landings. */
  landings: LandingEntry[];
  /** Every flight (club and outside) with the type group flown, for the club's recency rule. */
  typeFlights: { date: IsoDate; typeGroup: string }[];
  lastFlightReview: IsoDate | null;
  medicalExpiresOn: IsoDate | null;
  /** Type groups the member holds a standing checkout in. */
  checkoutTypeGroups: string[];
  recencyDaysInType: number;
  /** The club's document reminder window (days), for medical and flight review. */
  documentWarnDays: number;
  today: IsoDate;
};

/**
 * Landing-based currency (90 days) and the club's recency window are flagged "ends soon" in
 * the last 14 days — our choice, shorter than the document window because the period itself
 * is short. Documents (medical, flight review) use the club's reminder setting.
 */
export const RECENCY_WARN_DAYS = 14;

function recencyState(current: boolean, lastDay: IsoDate | null, today: IsoDate): CurrencyState {
  if (lastDay === null) return "missing";
  if (!current) return "expired";
  return daysBetween(today, lastDay) <= RECENCY_WARN_DAYS ? "expiring" : "current";
}

function documentState(lastDay: IsoDate | null, today: IsoDate, warnDays: number): CurrencyState {
  if (lastDay === null) return "missing";
  const status = documentExpiryStatus(lastDay, today, warnDays);
  return status === "valid" ? "current" : status;
}

/**
 * One member's currency as the board and their own page show it. Every rule comes from
 * lib/currency (the same functions the booking checks use); this only arranges the results.
 */
export function summarizeCurrency(input: CurrencyInput): { items: CurrencyItem[]; next: CurrencyItem | null; attention: number } {
  const { today } = input;
  const passenger = passengerCurrency(input.landings, today);
  const reviewDue = input.lastFlightReview ? flightReviewDue(input.lastFlightReview) : null;
  const items: CurrencyItem[] = [
    { key: "passenger_day", label: "Passengers by day", state: recencyState(passenger.day.current, passenger.day.lastDay, today), lastDay: passenger.day.lastDay },
    { key: "passenger_night", label: "Passengers at night", state: recencyState(passenger.night.current, passenger.night.lastDay, today), lastDay: passenger.night.lastDay },
    { key: "flight_review", label: "Flight review", state: documentState(reviewDue, today, input.documentWarnDays), lastDay: reviewDue },
    { key: "medical", label: "Medical", state: documentState(input.medicalExpiresOn, today, input.documentWarnDays), lastDay: input.medicalExpiresOn },
  ];
  const byKey = new Map<string, string>();
  for (const g of input.checkoutTypeGroups) if (!byKey.has(normalizeTypeGroup(g))) byKey.set(normalizeTypeGroup(g), g);
  const groups = [...byKey.entries()].sort((a, b) => a[1].localeCompare(b[1]));
  for (const [key, group] of groups) {
    const flown = input.typeFlights.filter((f) => normalizeTypeGroup(f.typeGroup) === key);
    const r = recencyInType(flown, today, input.recencyDaysInType);
    items.push({ key: `recency:${key}`, label: `Recency in ${group}`, state: recencyState(r.current, r.lastDay, today), lastDay: r.lastDay });
  }
  const running = items.filter((i) => (i.state === "current" || i.state === "expiring") && i.lastDay !== null);
  running.sort((a, b) => compareIsoDates(a.lastDay!, b.lastDay!));
  return { items, next: running[0] ?? null, attention: items.filter((i) => i.state !== "current").length };
}
