import { aircraftClassKey, aircraftClassLabel, documentExpiryStatus, flightReviewDue, passengerCurrency, recencyInType, type AircraftClass, type LandingEntry } from "@/lib/currency";
import { compareIsoDates, daysBetween, type IsoDate } from "@/lib/dates";
import { normalizeTypeGroup } from "./audience";

export type CurrencyState = "current" | "expiring" | "expired" | "missing";

export const CURRENCY_STATE_LABELS: Record<CurrencyState, string> = {
  current: "Current",
  expiring: "Expires soon",
  expired: "Expired",
  missing: "Missing record",
};

/**
 * `state` and `lastDay` come from verified records only (the club's own flight log, and what an
 * instructor or the safety officer verified). `claim` is what the member's own unverified
 * entries would make of it, present only when they would change it: shown, never counted.
 */
export type CurrencyItem = { key: string; label: string; state: CurrencyState; lastDay: IsoDate | null; claim?: { state: CurrencyState; lastDay: IsoDate | null } };

/** A record's standing: verified (counts) or the member's own claim (shown only). */
export type Claimable = { claimed?: boolean };

export type CurrencyInput = {
  /** Club flights and outside-flight entries alike, each with its landings. */
  landings: (LandingEntry & Claimable)[];
  /** Every flight (club and outside) with the type group flown, for the club's recency rule. */
  typeFlights: ({ date: IsoDate; typeGroup: string } & Claimable)[];
  /** The latest verified flight review. */
  lastFlightReview: IsoDate | null;
  /** The latest flight review including the member's own claims, when later than the verified one. */
  claimedFlightReview?: IsoDate | null;
  /** The verified medical's last day. */
  medicalExpiresOn: IsoDate | null;
  /** The last day of the latest medical including claims, when it differs. */
  claimedMedicalExpiresOn?: IsoDate | null;
  /**
   * The categories and classes the club flies (its fleet): passenger currency is shown for
   * each (14 CFR 61.57(a)(1)(i)). Empty or absent: one class-blind line.
   */
  classes?: AircraftClass[];
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

type Records = { landings: LandingEntry[]; typeFlights: { date: IsoDate; typeGroup: string }[]; review: IsoDate | null; medical: IsoDate | null };

function itemsFrom(input: CurrencyInput, r: Records): CurrencyItem[] {
  const { today } = input;
  const items: CurrencyItem[] = [];
  const classes = input.classes ?? [];
  if (classes.length === 0) {
    const passenger = passengerCurrency(r.landings, today);
    items.push(
      { key: "passenger_day", label: "Passengers by day", state: recencyState(passenger.day.current, passenger.day.lastDay, today), lastDay: passenger.day.lastDay },
      { key: "passenger_night", label: "Passengers at night", state: recencyState(passenger.night.current, passenger.night.lastDay, today), lastDay: passenger.night.lastDay },
    );
  }
  for (const c of classes) {
    const passenger = passengerCurrency(r.landings, today, c);
    const key = aircraftClassKey(c);
    const label = aircraftClassLabel(c);
    items.push(
      { key: `passenger_day:${key}`, label: `Passengers by day — ${label}`, state: recencyState(passenger.day.current, passenger.day.lastDay, today), lastDay: passenger.day.lastDay },
      { key: `passenger_night:${key}`, label: `Passengers at night — ${label}`, state: recencyState(passenger.night.current, passenger.night.lastDay, today), lastDay: passenger.night.lastDay },
    );
  }
  const reviewDue = r.review ? flightReviewDue(r.review) : null;
  items.push(
    { key: "flight_review", label: "Flight review", state: documentState(reviewDue, today, input.documentWarnDays), lastDay: reviewDue },
    { key: "medical", label: "Medical", state: documentState(r.medical, today, input.documentWarnDays), lastDay: r.medical },
  );
  const byKey = new Map<string, string>();
  for (const g of input.checkoutTypeGroups) if (!byKey.has(normalizeTypeGroup(g))) byKey.set(normalizeTypeGroup(g), g);
  const groups = [...byKey.entries()].sort((a, b) => a[1].localeCompare(b[1]));
  for (const [key, group] of groups) {
    const flown = r.typeFlights.filter((f) => normalizeTypeGroup(f.typeGroup) === key);
    const rec = recencyInType(flown, today, input.recencyDaysInType);
    items.push({ key: `recency:${key}`, label: `Recency in ${group}`, state: recencyState(rec.current, rec.lastDay, today), lastDay: rec.lastDay });
  }
  return items;
}

/**
 * One member's currency as the board and their own page show it. Every rule comes from
 * lib/currency (the same functions the booking checks use); this only arranges the results.
 * Claims are not proof: each item counts verified records only, and carries what the member's
 * own claims would make of it beside, so the board can show "claimed" without it counting.
 */
export function summarizeCurrency(input: CurrencyInput): { items: CurrencyItem[]; next: CurrencyItem | null; attention: number } {
  const verified: Records = {
    landings: input.landings.filter((l) => !l.claimed),
    typeFlights: input.typeFlights.filter((f) => !f.claimed),
    review: input.lastFlightReview,
    medical: input.medicalExpiresOn,
  };
  const items = itemsFrom(input, verified);
  const anyClaim = input.landings.some((l) => l.claimed) || input.typeFlights.some((f) => f.claimed) || Boolean(input.claimedFlightReview) || Boolean(input.claimedMedicalExpiresOn);
  if (anyClaim) {
    const withClaims = itemsFrom(input, {
      landings: input.landings,
      typeFlights: input.typeFlights,
      review: input.claimedFlightReview ?? input.lastFlightReview,
      medical: input.claimedMedicalExpiresOn ?? input.medicalExpiresOn,
    });
    for (const item of items) {
      const other = withClaims.find((w) => w.key === item.key);
      if (other && (other.lastDay !== item.lastDay || other.state !== item.state)) item.claim = { state: other.state, lastDay: other.lastDay };
    }
  }
  const running = items.filter((i) => (i.state === "current" || i.state === "expiring") && i.lastDay !== null);
  running.sort((a, b) => compareIsoDates(a.lastDay!, b.lastDay!));
  return { items, next: running[0] ?? null, attention: items.filter((i) => i.state !== "current").length };
}
