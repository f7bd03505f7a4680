// Input and output shapes of the airworthiness rules. Plain data so that the database layer,
// the flight-line route and the tests can all build them without this folder knowing how.

import type { IsoDate } from "@/lib/dates";

export type { IsoDate };

/** Which rules apply to an aircraft. A missing flag means "no". */
export interface AircraftFlags {
  /** Carries persons for hire: the 100-hour applies (14 CFR 91.409(b)). */
  usedForHire?: boolean;
  /** Used for flight instruction for hire: the 100-hour applies (14 CFR 91.409(b)). */
  usedForInstruction?: boolean;
  /** Either IFR flag brings the IFR-only tests (91.411, 91.171) into play. */
  ifrEquipped?: boolean;
  usedForIfr?: boolean;
}

export type InspectionRule =
  /** Due at the end of the month N calendar months after the month it was done. */
  | { kind: "calendar-months"; months: number }
  /** Due N meter hours after the last one; the overrun is allowed only to reach the shop. */
  | { kind: "hours"; hours: number; overrunHours?: number }
  /** Whichever comes first; the months part is counted in calendar months. */
  | { kind: "months-or-hours"; months: number; hours: number; overrunHours?: number }
  /** Expires on the date recorded with the last completion (`Completion.expiresOn`). */
  | { kind: "fixed-date" }
  /** Counted to the day: due `days` days after the day it was done. */
  | { kind: "days"; days: number };

/** The two meters hours can be read on. */
export type MeterName = "hobbs" | "tach";

export interface Completion {
  /** The record's id, when it has one (lets the app point at the governing completion). */
  id?: string;
  date: IsoDate;
  /** Meter hours when it was done; needed by hours-based items. */
  hours?: number | null;
  /** The meter `hours` were read on. Absent or null: not recorded (taken as the aircraft's
   *  current meter, the behaviour from before meters were stored; see nextDue). */
  meter?: MeterName | null;
  /** For fixed-date items: the expiry this completion set (battery 50 % life, registration). */
  expiresOn?: IsoDate | null;
}

/** Cumulative use that also makes an item due, e.g. ELT transmitter time on one battery. */
export interface UsageLimit {
  /** Due when use is *more than* this many hours (14 CFR 91.207(c): 1 cumulative hour). */
  limitHours: number;
  /** Use since the last completion; null when nobody has recorded it. */
  usedHours: number | null;
}

export interface InspectionItem {
  /** Stable key, unique per aircraft (e.g. "annual", "100-hour", "ad-2020-01-01"). */
  key: string;
  /** Plain-English name used in reasons, e.g. "Annual inspection". */
  name: string;
  rule: InspectionRule;
  /** Required items ground the aircraft when overdue; others only advise. */
  required: boolean;
  /** Needed only for IFR flight: overdue means "no IFR", not "grounded". */
  ifrOnly: boolean;
  /** Applies only when the aircraft is used for hire or instruction (the 100-hour). */
  hireOrInstructionOnly?: boolean;
  /** Keys of other items whose completions also count for this one (annual → 100-hour). */
  satisfiedBy?: string[];
  usage?: UsageLimit;
  /** Published source named in reason texts, e.g. "14 CFR 91.409(a)". */
  source?: string;
  completions: Completion[];
}

export type SquawkTriage = "untriaged" | "grounding" | "deferred" | "note";

export interface Squawk {
  id?: string;
  description: string;
  open: boolean;
  triage: SquawkTriage;
  /** Deferred: what the pilot may not do, e.g. "No night flight: left landing light inop". */
  limitation?: string | null;
  /** Deferred: confirmed removed or deactivated and placarded inoperative (14 CFR 91.213(d)). */
  placarded?: boolean;
  /** The reporter said it may affect airworthiness; counts until maintenance triages it. */
  suspectedGrounding?: boolean;
}

export interface GroundingNotice {
  id?: string;
  reason: string;
  /** ISO instant ("2026-05-01T14:00:00Z") or ISO date. */
  effectiveAt: string;
  /** Set when the notice was lifted; lifting is a recorded past event. */
  liftedAt?: string | null;
}

/** Club settings: how far ahead an item counts as due soon. */
export interface DueSoonThresholds {
  days: number;
  hours: number;
}

export interface AircraftStatusInput {
  flags: AircraftFlags;
  items: InspectionItem[];
  squawks?: Squawk[];
  notices?: GroundingNotice[];
  /** Defaults to DEFAULT_DUE_SOON when the club has not set its own. */
  dueSoon?: DueSoonThresholds;
  /** The meter `currentHours` is read on (the one the hours-based items count). Absent: every
   *  completion is taken as read on it (the behaviour from before meters were stored). */
  meter?: MeterName;
  /** ISO instant of "now" for notice effective times; without it, a notice counts from the
   *  start of its effective date (earlier, never later, than the real instant). */
  now?: string;
  /** The club's IANA time zone: notice times are written on its clock. Absent: written in UTC, said so. */
  timeZone?: string;
}

export type AircraftStatus = "flyable" | "limited" | "grounded" | "unknown";

export interface StatusReason {
  code: string;
  text: string;
  grounding: boolean;
}

export interface AircraftStatusResult {
  status: AircraftStatus;
  reasons: StatusReason[];
}

export type MissingData =
  "no-completion" | "no-completion-hours" | "no-current-hours" | "no-expiry-date" | "no-use-record" | "other-meter";

/** How late the governing completion of an hours-based item was done (14 CFR 91.409(b)). */
export interface LateCompletion {
  /** Hours flown past the point where it fell due. */
  lateHours: number;
  /** Later than the due point plus the overrun allowance. */
  beyondOverrun: boolean;
  /** The due point it was late against. */
  fellDueAt: number;
  /** The next interval counts from fellDueAt (false: a whole interval late, counted afresh). */
  countsFromDuePoint: boolean;
}

/** What comes due next for one item; null fields do not apply or cannot be computed. */
export interface NextDue {
  key: string;
  name: string;
  /** The completion the due point counts from (own or from a `satisfiedBy` item). */
  lastDone: Completion | null;
  dueDate: IsoDate | null;
  /** Days from today to dueDate; negative once overdue. */
  daysLeft: number | null;
  dueHours: number | null;
  overrunLimitHours: number | null;
  /** Hours from currentHours to dueHours; negative once overdue. */
  hoursLeft: number | null;
  useLimitHours: number | null;
  /** Use left before the limit; negative once exceeded. */
  useLeftHours: number | null;
  overdue: boolean;
  missing: MissingData[];
  /** Set with "other-meter": the governing completion's meter and the aircraft's meter now. */
  meterMismatch?: { completionMeter: MeterName; currentMeter: MeterName } | null;
  /** Set when the governing completion was done after the item fell due (hours-based). */
  late?: LateCompletion | null;
}
