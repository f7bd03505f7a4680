// The invented money history of the demo clubs, computed from the day the seed runs: four
// months of dues (billing runs, so statements exist), every seeded flight charged, most members
// paying by card or cheque, one member in arrears (pilot2@ in Reedwater), and Cottonwood's
// bank reconciled and locked through the month before last (its last month is left to do).
import { and, eq } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { aircraft, bankLines, clubs, duesPlans, flights, memberDues, memberships, moneySettings, payments, rateProfiles, type Club } from "@/db/schema";
import { addDays, isoDateInTimeZone, type IsoDate } from "@/lib/dates";
import { accountId, memberAccountId } from "@/db/queries/money-accounts";
import { memberMovements } from "@/db/queries/money-member-balances";
import { storeStatement } from "@/db/queries/money-reconcile-import";
import { parseStatementFile } from "@/lib/reconcile";
import { bankViewCsv, bankViewOf } from "@/db/queries/money-reconcile-bank-view";
import { runBillingPeriod } from "@/db/queries/money-billing-run";
import { recordCardPayment, recordPayoutShare } from "@/db/queries/money-card-payments";
import { postFlightCharge } from "@/db/queries/money-flight-charges";
import { fuelCreditMinor } from "@/lib/money/fuel-credit";
import { monthOf, monthRange, shiftMonthKey } from "@/lib/money/months";
import { postEntry } from "@/db/queries/money-post-entry";
import { autoMatchStatement } from "@/db/queries/money-reconcile-match";
import { bookBankLine, lockPeriod } from "@/db/queries/money-reconcile-edits";
import type { SeededFoundation } from "./foundation";

type ClubKey = "cottonwood" | "reedwater" | "silberau";

const SETTINGS: Record<ClubKey, { lateFeeFlatMinor: number; fuelCreditCapPerUnitMinor: number; openingMinor: number }> = {
  cottonwood: { lateFeeFlatMinor: 1000, fuelCreditCapPerUnitMinor: 640, openingMinor: 920_000 },
  reedwater: { lateFeeFlatMinor: 1500, fuelCreditCapPerUnitMinor: 660, openingMinor: 1_850_000 },
  silberau: { lateFeeFlatMinor: 1000, fuelCreditCapPerUnitMinor: 245, openingMinor: 1_400_000 },
};

const PLANS: Record<ClubKey, { name: string; period: "monthly" | "quarterly" | "annual"; category: "full" | "student" | "inactive"; amountMinor: number }[]> = {
  cottonwood: [
    { name: "Full member, quarterly", period: "quarterly", category: "full", amountMinor: 24_000 },
    { name: "Student pilot, monthly", period: "monthly", category: "student", amountMinor: 4_000 },
  ],
  reedwater: [
    { name: "Full member, monthly", period: "monthly", category: "full", amountMinor: 9_500 },
    { name: "Student pilot, monthly", period: "monthly", category: "student", amountMinor: 4_500 },
    { name: "Inactive member, annual", period: "annual", category: "inactive", amountMinor: 12_000 },
  ],
  silberau: [
    { name: "Vollmitglied (full), monthly", period: "monthly", category: "full", amountMinor: 7_000 },
    { name: "Jugend (youth), monthly", period: "monthly", category: "student", amountMinor: 3_000 },
  ],
};

// Invented cost figures for the hourly-rate calculator (own round numbers, not any real aircraft's).
const RATES: Record<ClubKey, { name: string; fixedAnnualCostsMinor: number; expectedHours: number; fuelBurnTenthsPerHour: number; fuelPriceMinor: number; oilPerHourMinor: number; maintenanceReservePerHourMinor: number; overhaulCostMinor: number; tboHours: number }> = {
  cottonwood: { name: "N0471C Larkspur L-2", fixedAnnualCostsMinor: 1_440_000, expectedHours: 320, fuelBurnTenthsPerHour: 62, fuelPriceMinor: 640, oilPerHourMinor: 120, maintenanceReservePerHourMinor: 1_800, overhaulCostMinor: 2_600_000, tboHours: 2_000 },
  reedwater: { name: "N0512L Fernwhistle F160", fixedAnnualCostsMinor: 1_800_000, expectedHours: 300, fuelBurnTenthsPerHour: 85, fuelPriceMinor: 660, oilPerHourMinor: 150, maintenanceReservePerHourMinor: 1_200, overhaulCostMinor: 3_000_000, tboHours: 2_000 },
  silberau: { name: "D-0SLA Larkspur L-2", fixedAnnualCostsMinor: 1_250_000, expectedHours: 260, fuelBurnTenthsPerHour: 240, fuelPriceMinor: 245, oilPerHourMinor: 110, maintenanceReservePerHourMinor: 1_500, overhaulCostMinor: 2_400_000, tboHours: 2_000 },
};

const STUDENTS = new Set(["student@hangarline.test"]);
const IN_ARREARS = new Set(["pilot2@hangarline.test"]);
/** Members who pay by cheque; everyone else pays by card. */
const CHEQUE_PAYERS = new Set(["twoclubs@hangarline.test", "cottonwood.maint@hangarline.test", "silberau.technik@hangarline.test"]);

/** The fake provider's fee schedule (2.9 % + 30, half up), so seeded payouts look like real ones. */
const feeFor = (amount: number) => Math.floor((amount * 29 + 500) / 1000) + 30;

function dayOf(month: string, day: number): IsoDate {
  const { start, end } = monthRange(month);
  const d = addDays(start, day - 1);
  return d > end ? end : d;
}

type Ctx = { key: ClubKey; club: Club; user: { id: string } | null; today: IsoDate; members: { userId: string; email: string }[]; seq: { n: number } };

function chargeFlights(tx: Tx, ctx: Ctx, from: IsoDate, to: IsoDate): void {
  const rows = tx
    .select({ id: flights.id, pilotId: flights.pilotId, flownOn: flights.flownOn, hobbsOut: flights.hobbsOut, hobbsIn: flights.hobbsIn, tachOut: flights.tachOut, tachIn: flights.tachIn, fuelAdded: flights.fuelAdded, rate: aircraft.hourlyRateMinor, meter: aircraft.rateMeter, registration: aircraft.registration })
    .from(flights)
    .innerJoin(aircraft, eq(aircraft.id, flights.aircraftId))
    .where(eq(flights.clubId, ctx.club.id))
    .all()
    .filter((f) => f.flownOn >= from && f.flownOn <= to && ctx.members.some((m) => m.userId === f.pilotId));
  for (const f of rows) {
    const hobbs = f.meter === "hobbs";
    // Every seventh flight with fuel bought away from home gets a credit at the club's cap.
    const away = f.fuelAdded > 0 && ctx.seq.n++ % 7 === 0;
    postFlightCharge(tx, ctx, {
      clubId: ctx.club.id,
      memberUserId: f.pilotId,
      flightId: f.id,
      meterOut: hobbs ? f.hobbsOut : f.tachOut,
      meterIn: hobbs ? f.hobbsIn : f.tachIn,
      ratePerHourMinor: f.rate,
      fuelCreditMinor: away ? fuelCreditMinor({ quantity: f.fuelAdded, paidPerUnitMinor: SETTINGS[ctx.key].fuelCreditCapPerUnitMinor + 35, capPerUnitMinor: SETTINGS[ctx.key].fuelCreditCapPerUnitMinor }) : 0,
      date: f.flownOn,
      aircraftLabel: f.registration,
    });
  }
}

function payBalances(tx: Tx, ctx: Ctx, month: string, payoutKey: string): void {
  const payDay = dayOf(month, 9);
  if (payDay > ctx.today) return;
  const carried: { chargeId: string; netMinor: number; feeMinor: number }[] = [];
  const statementEnd = addDays(monthRange(month).start, -1);
  const lastMonth = shiftMonthKey(monthOf(ctx.today), -1);
  let inTransit = ctx.key === "cottonwood" && month === lastMonth;
  ctx.members.forEach((m, i) => {
    if (IN_ARREARS.has(m.email)) return;
    // Members pay last month's statement: its closing balance.
    const owed = memberMovements(tx, ctx.club.id, m.userId).filter((x) => x.date <= statementEnd).reduce((sum, x) => sum + x.amountMinor, 0);
    if (owed <= 0) return;
    const date = dayOf(month, 9 + (i % 4));
    if (date > ctx.today) return;
    if (CHEQUE_PAYERS.has(m.email)) {
      // One cheque of last month is banked on its final day: a deposit in transit on the statement.
      const chequeDate = inTransit ? monthRange(month).end : date;
      inTransit = false;
      const reference = String(1040 + ctx.seq.n++);
      const { entryId } = postEntry(tx, ctx.club.id, {
        date: chequeDate,
        kind: "manual-payment",
        memo: `Cheque payment ${reference}`,
        lines: [{ accountId: accountId(tx, ctx.club.id, "bank"), debitMinor: owed }, { accountId: memberAccountId(tx, ctx.club.id, m.userId), creditMinor: owed }],
        memberUserId: m.userId,
        sourceType: "payment",
        reference,
        createdById: ctx.user?.id ?? null,
      });
      tx.insert(payments).values({ clubId: ctx.club.id, memberUserId: m.userId, method: "cheque", status: "succeeded", amountMinor: owed, currency: ctx.club.currency, receivedOn: chequeDate, reference, journalEntryId: entryId, recordedById: ctx.user?.id ?? null }).run();
      return;
    }
    const n = ctx.seq.n++;
    const fee = feeFor(owed);
    const chargeId = `ch_seed_${payoutKey}_${n}`;
    recordCardPayment(tx, { clubId: ctx.club.id, memberUserId: m.userId, paymentId: null, checkoutSessionId: `cs_seed_${payoutKey}_${n}`, paymentIntentId: `pi_seed_${payoutKey}_${n}`, chargeId, status: "succeeded", amountMinor: owed, feeMinor: fee, currency: ctx.club.currency.toLowerCase(), paidAt: new Date(`${date}T15:00:00Z`), lastError: null });
    carried.push({ chargeId, netMinor: owed - fee, feeMinor: fee });
  });
  const arrival = dayOf(month, 15);
  if (carried.length && arrival <= ctx.today) {
    recordPayoutShare(tx, { clubId: ctx.club.id, payoutId: `po_seed_${payoutKey}`, arrivalOn: arrival, currency: ctx.club.currency.toLowerCase(), charges: carried, refunds: [] });
  }
}

/** Imports the bank's statement for `month`, matches it, books the bank fee and, if asked, locks it. */
function reconcileMonth(tx: Tx, ctx: Ctx, month: string, lock: boolean): void {
  const view = bankViewOf(tx, ctx.club.id, month, { through: ctx.today, monthlyFeeMinor: 800 });
  const csv = bankViewCsv(view);
  const parsed = parseStatementFile({ format: "csv", text: csv, currency: ctx.club.currency, mapping: { date: "Date", description: "Description", amount: "Amount", reference: "Reference" } });
  if (!parsed.ok) throw new Error(parsed.errors.join("; "));
  const actor = { clubId: ctx.club.id, userId: ctx.user?.id ?? null, currency: ctx.club.currency };
  const { statementId } = storeStatement(tx, { clubId: ctx.club.id, userId: actor.userId, currency: ctx.club.currency, format: "csv", fileName: `bank-${month}.csv`, text: csv, parsed, closingBalanceMinor: view.closingMinor, periodStart: view.periodStart, periodEnd: view.periodEnd });
  autoMatchStatement(tx, actor, statementId);
  if (!lock) return;
  const fees = tx.select({ id: bankLines.id }).from(bankLines).where(and(eq(bankLines.clubId, ctx.club.id), eq(bankLines.statementId, statementId), eq(bankLines.description, "ACCOUNT MAINTENANCE FEE"))).all();
  for (const fee of fees) bookBankLine(tx, actor, fee.id, "bank-fees", "Bank account fee");
  lockPeriod(tx, actor, statementId);
}

export function seedMoney(db: Db, foundation: SeededFoundation, opts: { now?: Date } = {}): void {
  db.transaction((tx) => {
    for (const key of ["cottonwood", "reedwater", "silberau"] as const) {
      const club = tx.select().from(clubs).where(eq(clubs.id, foundation.clubIds[key]!)).get()!;
      const today = isoDateInTimeZone(opts.now ?? new Date(), club.timeZone);
      const treasurer = Object.entries(foundation.userIds).find(([email]) => email === (key === "reedwater" ? "treasurer@hangarline.test" : key === "cottonwood" ? "cottonwood.admin@hangarline.test" : "silberau.admin@hangarline.test"));
      const members = tx.select().from(memberships).where(eq(memberships.clubId, club.id)).all().filter((m) => m.roles.includes("member"));
      const emails = new Map(Object.entries(foundation.userIds).map(([email, id]) => [id, email]));
      const ctx: Ctx = { key, club, user: treasurer ? { id: treasurer[1] } : null, today, members: members.map((m) => ({ userId: m.userId, email: emails.get(m.userId) ?? "" })), seq: { n: 0 } };
      const s = SETTINGS[key];
      tx.insert(moneySettings).values({ clubId: club.id, paymentTermsDays: 14, lateFeeFlatMinor: s.lateFeeFlatMinor, fuelCreditCapPerUnitMinor: s.fuelCreditCapPerUnitMinor }).run();
      const r = RATES[key];
      tx.insert(rateProfiles).values({ clubId: club.id, ...r }).run();
      const plans = new Map<string, string>();
      for (const p of PLANS[key]) plans.set(p.category, tx.insert(duesPlans).values({ clubId: club.id, currency: club.currency, ...p }).returning({ id: duesPlans.id }).all()[0]!.id);
      const m0 = monthOf(today);
      const first = shiftMonthKey(m0, -3);
      for (const m of ctx.members) {
        const student = STUDENTS.has(m.email);
        // The student joined part way through last month, so their first dues are prorated.
        const startsOn = student ? dayOf(shiftMonthKey(m0, -1), 17) : monthRange(first).start;
        tx.insert(memberDues).values({ clubId: club.id, memberUserId: m.userId, planId: plans.get(student ? "student" : "full")!, category: student ? "student" : "full", startsOn }).run();
      }
      postEntry(tx, club.id, {
        date: monthRange(first).start,
        kind: "opening",
        memo: "Opening balance brought into Hangarline",
        lines: [{ accountId: accountId(tx, club.id, "bank"), debitMinor: s.openingMinor }, { accountId: accountId(tx, club.id, "retained-funds"), creditMinor: s.openingMinor }],
        createdById: ctx.user?.id ?? null,
      });
      for (let k = -3; k <= 0; k++) {
        const month = shiftMonthKey(m0, k);
        const { start, end } = monthRange(month);
        runBillingPeriod(tx, ctx, { month, runDate: start });
        chargeFlights(tx, ctx, start, end < today ? end : today);
        payBalances(tx, ctx, month, `${key}_${month}`);
      }
      if (key === "cottonwood") {
        reconcileMonth(tx, ctx, shiftMonthKey(m0, -3), true);
        reconcileMonth(tx, ctx, shiftMonthKey(m0, -2), true);
      }
      // Reedwater's treasurer has imported three months and not finished: bank fees to post.
      if (key === "reedwater") for (const k of [-3, -2, -1]) reconcileMonth(tx, ctx, shiftMonthKey(m0, k), false);
    }
  });
}

/** For tests: the club's statement from the bank for `month`, as the CSV the bank would send. */
export function demoBankStatement(db: Db | Tx, clubId: string, month: string, now = new Date()) {
  const club = db.select().from(clubs).where(eq(clubs.id, clubId)).get()!;
  const view = bankViewOf(db, clubId, month, { through: isoDateInTimeZone(now, club.timeZone), monthlyFeeMinor: 800 });
  return { ...view, csv: bankViewCsv(view) };
}
