import "server-only";
// Posting a flight's charge to the pilot's member account. The flight sheet calls
// postFlightCharge inside its own transaction, right after it writes the flight row.
import { and, desc, eq } from "drizzle-orm";
import { journalEntries } from "@/db/schema";
import type { IsoDate } from "@/lib/dates";
import { formatMoney, meterTimeCharge, subtractExact } from "@/lib/money";
import { accountId, memberAccountId, type DbLike } from "./money-accounts";
import { LedgerError } from "@/lib/money/errors";
import { postEntry, reverseEntry } from "./money-post-entry";
import { getMoneySettings } from "./money-settings";
import { dueDateFor } from "@/lib/money/settings";

/** Who is posting, in which club. A ClubContext (lib/server/club-context) fits. */
export type PostingContext = { club: { id: string; currency: string; locale?: string }; user?: { id: string } | null };

export type FlightChargeRequest = {
  clubId: string;
  /** The pilot whose account is charged; must hold a membership of the club. */
  memberUserId: string;
  flightId: string;
  /** The meter the aircraft bills by (Hobbs or tach), in hours, e.g. 1233.5 → 1234.7. */
  meterOut: number;
  meterIn: number;
  /** The aircraft's rate per meter hour in minor units: its wet rate, or its dry rate when the member pays fuel. */
  ratePerHourMinor: number;
  /** Credit for fuel bought away from home, already capped (see fuelCreditMinor in ./fuel-credit). */
  fuelCreditMinor?: number;
  /** The flight's calendar date in the club's time zone. */
  date: IsoDate;
  /** Shown on the statement, e.g. the registration "N0123X". */
  aircraftLabel?: string;
  /**
   * The journal date when it differs from the flight's date: the first open day when the
   * flight's date sits in a locked period (lib/money/open-period). The memo keeps `date`.
   */
  postOn?: IsoDate;
};

export type FlightChargePosting = {
  /** False when an earlier call already posted this flight (or there was nothing to charge). */
  posted: boolean;
  entryId: string | null;
  timeChargeMinor: number;
  fuelCreditMinor: number;
  /** What the member owes for the flight: time charge − fuel credit (negative: a credit). */
  netMinor: number;
};

const SOURCE = "flight";

function currentEntry(tx: DbLike, clubId: string, flightId: string) {
  const entries = tx
    .select({ id: journalEntries.id, reversesEntryId: journalEntries.reversesEntryId })
    .from(journalEntries)
    .where(and(eq(journalEntries.clubId, clubId), eq(journalEntries.sourceType, SOURCE), eq(journalEntries.sourceId, flightId)))
    .orderBy(desc(journalEntries.createdAt))
    .all();
  const reversed = new Set(entries.map((e) => e.reversesEntryId).filter(Boolean));
  const live = entries.find((e) => !e.reversesEntryId && !reversed.has(e.id));
  return { live, revision: entries.filter((e) => !e.reversesEntryId).length };
}

/**
 * Posts a flight's charge in one balanced entry: debit the member's account and credit flight
 * income with meter hours × rate (flightCharge rules in lib/money: exact decimals, half away from
 * zero), and — when there is a fuel credit — debit fuel credits and credit the member.
 *
 * Idempotent per flight: calling it again for the same flightId returns the first posting and
 * writes nothing. After reverseFlightCharge (a corrected flight), the next call posts afresh.
 *
 * Throws PeriodLockedError (a LedgerError, code "locked") when `date` is inside a reconciled,
 * locked period, LedgerError "not-member" when the pilot holds no membership of the club, and
 * RangeError for meters that run backwards or a negative rate. Run it inside the transaction
 * that writes the flight, so a refused charge also refuses the flight.
 */
export function postFlightCharge(tx: DbLike, ctx: PostingContext, flight: FlightChargeRequest): FlightChargePosting {
  if (flight.clubId !== ctx.club.id) throw new LedgerError("The flight belongs to another club.", "not-found");
  const timeChargeMinor = meterTimeCharge(flight.meterOut, flight.meterIn, flight.ratePerHourMinor);
  const fuelCredit = flight.fuelCreditMinor ?? 0;
  if (!Number.isSafeInteger(fuelCredit) || fuelCredit < 0) throw new RangeError(`fuelCreditMinor must be whole minor units ≥ 0, got ${fuelCredit}`);
  const result = { timeChargeMinor, fuelCreditMinor: fuelCredit, netMinor: timeChargeMinor - fuelCredit };
  const { live, revision } = currentEntry(tx, ctx.club.id, flight.flightId);
  if (live) return { posted: false, entryId: live.id, ...result };
  if (timeChargeMinor === 0 && fuelCredit === 0) return { posted: false, entryId: null, ...result };

  const member = memberAccountId(tx, ctx.club.id, flight.memberUserId);
  const hours = subtractExact(flight.meterIn, flight.meterOut);
  const label = flight.aircraftLabel ? `${flight.aircraftLabel} ` : "";
  const lines = [];
  if (timeChargeMinor > 0) {
    lines.push({ accountId: member, debitMinor: timeChargeMinor, memo: `${hours.toFixed(1)} h × ${formatMoney(flight.ratePerHourMinor, ctx.club.currency, ctx.club.locale)}` });
    lines.push({ accountId: accountId(tx, ctx.club.id, "flight-income"), creditMinor: timeChargeMinor });
  }
  if (fuelCredit > 0) {
    lines.push({ accountId: accountId(tx, ctx.club.id, "fuel-credits"), debitMinor: fuelCredit, memo: "Fuel bought away from home" });
    lines.push({ accountId: member, creditMinor: fuelCredit, memo: "Fuel credit" });
  }
  const settings = getMoneySettings(tx, ctx.club.id);
  const postOn = flight.postOn ?? flight.date;
  const moved = postOn !== flight.date ? `, posted ${postOn} (its day is in a locked period)` : "";
  const { entryId } = postEntry(tx, ctx.club.id, {
    date: postOn,
    kind: "flight",
    memo: `Flight ${label}${flight.date}, ${hours.toFixed(1)} h${fuelCredit > 0 ? " less fuel credit" : ""}${moved}`,
    lines,
    memberUserId: flight.memberUserId,
    dueOn: result.netMinor > 0 ? dueDateFor(postOn, settings) : null,
    sourceType: SOURCE,
    sourceId: flight.flightId,
    sourceKey: `${SOURCE}:${flight.flightId}:${revision + 1}`,
    createdById: ctx.user?.id ?? null,
  });
  return { posted: true, entryId, ...result };
}

/**
 * Undoes a flight's posted charge with a reversing entry (for a flight corrected or voided).
 * `date` defaults to the flight's original date; give today when that date is locked.
 * Returns the reversal's id, or null when nothing was posted for the flight.
 */
export function reverseFlightCharge(tx: DbLike, ctx: PostingContext, flightId: string, opts: { date?: IsoDate; memo?: string } = {}): string | null {
  const { live } = currentEntry(tx, ctx.club.id, flightId);
  if (!live) return null;
  return reverseEntry(tx, ctx.club.id, live.id, { date: opts.date, memo: opts.memo ?? "Flight charge corrected", createdById: ctx.user?.id ?? null }).entryId;
}
