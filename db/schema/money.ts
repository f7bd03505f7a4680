import { sql } from "drizzle-orm";
import { check, index, integer, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import type { CsvMapping } from "@/lib/reconcile";
import { users } from "./auth";
import { clubs } from "./clubs";
import { id, timestamps } from "./columns";
import { uploads } from "./uploads";
import { DUES_PERIODS, MEMBER_CATEGORIES } from "@/lib/money/dues";

// Money: a double-entry journal per club in integer minor units of the club's currency.
// journal_entries and journal_lines are append-only (triggers in the migration): a mistake is
// undone by a reversing entry. Everything else here records how entries came to be posted.

const clubId = () => text("club_id").notNull().references(() => clubs.id);
const money = (name: string) => integer(name).notNull();

/** Chart of accounts. Member receivables are one sub-account per member (memberUserId set). */
export const ledgerAccounts = sqliteTable(
  "ledger_accounts",
  {
    id: id(),
    clubId: clubId(),
    /** "bank", "dues-income", … or "member-receivables:<userId>" for a member's account. */
    code: text("code").notNull(),
    name: text("name").notNull(),
    type: text("type", { enum: ["asset", "liability", "equity", "income", "expense"] }).notNull(),
    parentCode: text("parent_code"),
    memberUserId: text("member_user_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [uniqueIndex("ledger_accounts_club_code").on(t.clubId, t.code), index("ledger_accounts_club_id").on(t.clubId, t.memberUserId)],
);

export const ENTRY_KINDS = [
  "opening", "dues", "late-fee", "flight", "adjustment", "card-payment", "card-refund", "manual-payment",
  "payout-received", "bank-item", "reversal", "bill", "bill-payment", "year-end-close",
] as const;
export type EntryKind = (typeof ENTRY_KINDS)[number];

export const journalEntries = sqliteTable(
  "journal_entries",
  {
    id: id(),
    clubId: clubId(),
    /** Calendar date in the club's time zone. */
    entryDate: text("entry_date").notNull(),
    kind: text("kind", { enum: ENTRY_KINDS }).notNull(),
    memo: text("memo").notNull(),
    currency: text("currency").notNull(),
    /** The member the entry is about, when there is one (dues, flights, payments). */
    memberUserId: text("member_user_id").references(() => users.id),
    /** For a charge to a member: when it falls due (ageing and arrears count from here). */
    dueOn: text("due_on"),
    /** What posted it ("flight", "billing-run", "payment", …) and that record's id. */
    sourceType: text("source_type"),
    sourceId: text("source_id"),
    /** Idempotency key: a second posting with the same key posts nothing. */
    sourceKey: text("source_key"),
    reference: text("reference"),
    reversesEntryId: text("reverses_entry_id"),
    createdById: text("created_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [
    index("journal_entries_club_id").on(t.clubId, t.entryDate),
    uniqueIndex("journal_entries_source_key").on(t.clubId, t.sourceKey),
    index("journal_entries_source").on(t.clubId, t.sourceType, t.sourceId),
    index("journal_entries_member").on(t.clubId, t.memberUserId),
    uniqueIndex("journal_entries_reverses").on(t.reversesEntryId),
  ],
);

export const journalLines = sqliteTable(
  "journal_lines",
  {
    id: id(),
    clubId: clubId(),
    entryId: text("entry_id").notNull().references(() => journalEntries.id),
    lineNo: integer("line_no").notNull(),
    accountId: text("account_id").notNull().references(() => ledgerAccounts.id),
    debitMinor: integer("debit_minor").notNull().default(0),
    creditMinor: integer("credit_minor").notNull().default(0),
    currency: text("currency").notNull(),
    memo: text("memo"),
    ...timestamps(),
  },
  (t) => [
    index("journal_lines_club_id").on(t.clubId, t.accountId),
    index("journal_lines_entry").on(t.entryId),
    check("journal_lines_one_side", sql`(${t.debitMinor} > 0 AND ${t.creditMinor} = 0) OR (${t.creditMinor} > 0 AND ${t.debitMinor} = 0)`),
  ],
);

export { DUES_PERIODS, MEMBER_CATEGORIES };

export const duesPlans = sqliteTable(
  "dues_plans",
  {
    id: id(),
    clubId: clubId(),
    name: text("name").notNull(),
    period: text("period", { enum: DUES_PERIODS }).notNull(),
    category: text("category", { enum: MEMBER_CATEGORIES }).notNull(),
    amountMinor: money("amount_minor"),
    currency: text("currency").notNull(),
    active: integer("active", { mode: "boolean" }).notNull().default(true),
    ...timestamps(),
  },
  (t) => [index("dues_plans_club_id").on(t.clubId), uniqueIndex("dues_plans_club_name").on(t.clubId, t.name)],
);

/** Which plan a member pays and since when (proration counts from startsOn). */
export const memberDues = sqliteTable(
  "member_dues",
  {
    id: id(),
    clubId: clubId(),
    memberUserId: text("member_user_id").notNull().references(() => users.id),
    planId: text("plan_id").notNull().references(() => duesPlans.id),
    category: text("category", { enum: MEMBER_CATEGORIES }).notNull(),
    startsOn: text("starts_on").notNull(),
    ...timestamps(),
  },
  (t) => [uniqueIndex("member_dues_club_member").on(t.clubId, t.memberUserId), index("member_dues_club_id").on(t.clubId)],
);

export const billingRuns = sqliteTable(
  "billing_runs",
  {
    id: id(),
    clubId: clubId(),
    /** First day of the month billed. */
    periodStart: text("period_start").notNull(),
    periodEnd: text("period_end").notNull(),
    runCount: integer("run_count").notNull().default(1),
    entriesPosted: integer("entries_posted").notNull().default(0),
    totalMinor: integer("total_minor").notNull().default(0),
    statementsIssued: integer("statements_issued").notNull().default(0),
    ranById: text("ran_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [uniqueIndex("billing_runs_club_period").on(t.clubId, t.periodStart), index("billing_runs_club_id").on(t.clubId)],
);

/** A member's monthly statement as issued; the lines are read from the journal. */
export const statements = sqliteTable(
  "statements",
  {
    id: id(),
    clubId: clubId(),
    memberUserId: text("member_user_id").notNull().references(() => users.id),
    periodStart: text("period_start").notNull(),
    periodEnd: text("period_end").notNull(),
    openingMinor: money("opening_minor"),
    chargesMinor: money("charges_minor"),
    creditsMinor: money("credits_minor"),
    closingMinor: money("closing_minor"),
    currency: text("currency").notNull(),
    billingRunId: text("billing_run_id").references(() => billingRuns.id),
    emailedAt: integer("emailed_at", { mode: "timestamp_ms" }),
    ...timestamps(),
  },
  (t) => [uniqueIndex("statements_club_member_period").on(t.clubId, t.memberUserId, t.periodStart), index("statements_club_id").on(t.clubId)],
);

export const PAYMENT_STATUSES = ["pending", "failed", "expired", "succeeded", "partially_refunded", "refunded"] as const;
export type PaymentStatus = (typeof PAYMENT_STATUSES)[number];

export const payments = sqliteTable(
  "payments",
  {
    id: id(),
    clubId: clubId(),
    memberUserId: text("member_user_id").notNull().references(() => users.id),
    method: text("method", { enum: ["card", "cheque", "cash", "transfer"] }).notNull(),
    status: text("status", { enum: PAYMENT_STATUSES }).notNull(),
    amountMinor: money("amount_minor"),
    feeMinor: integer("fee_minor").notNull().default(0),
    refundedMinor: integer("refunded_minor").notNull().default(0),
    currency: text("currency").notNull(),
    receivedOn: text("received_on"),
    reference: text("reference"),
    checkoutSessionId: text("checkout_session_id").unique(),
    paymentIntentId: text("payment_intent_id").unique(),
    chargeId: text("charge_id"),
    payoutId: text("payout_id"),
    lastError: text("last_error"),
    journalEntryId: text("journal_entry_id").references(() => journalEntries.id),
    recordedById: text("recorded_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [index("payments_club_id").on(t.clubId, t.memberUserId), index("payments_charge").on(t.chargeId), index("payments_payout").on(t.clubId, t.payoutId)],
);

export const paymentRefunds = sqliteTable(
  "payment_refunds",
  {
    id: id(),
    clubId: clubId(),
    paymentId: text("payment_id").notNull().references(() => payments.id),
    providerRefundId: text("provider_refund_id").notNull().unique(),
    amountMinor: money("amount_minor"),
    currency: text("currency").notNull(),
    treatment: text("treatment", { enum: ["reopen", "absorb"] }).notNull(),
    payoutId: text("payout_id"),
    journalEntryId: text("journal_entry_id").references(() => journalEntries.id),
    requestedById: text("requested_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [index("payment_refunds_club_id").on(t.clubId, t.paymentId)],
);

/** Every webhook event acted on, by the provider's event id: a replay is recognised here. */
export const paymentEvents = sqliteTable(
  "payment_events",
  {
    id: id(),
    clubId: clubId(),
    eventId: text("event_id").notNull(),
    type: text("type").notNull(),
    outcome: text("outcome").notNull(),
    ...timestamps(),
  },
  (t) => [uniqueIndex("payment_events_club_event").on(t.clubId, t.eventId), index("payment_events_club_id").on(t.clubId)],
);

/** A provider payout's share for this club: the card payments it carries, net of fees. */
export const cardPayouts = sqliteTable(
  "card_payouts",
  {
    id: id(),
    clubId: clubId(),
    payoutId: text("payout_id").notNull(),
    netMinor: money("net_minor"),
    feeMinor: money("fee_minor"),
    currency: text("currency").notNull(),
    arrivalOn: text("arrival_on").notNull(),
    /** Set once the bank statement shows it and the transfer to the bank account is posted. */
    receivedEntryId: text("received_entry_id").references(() => journalEntries.id),
    ...timestamps(),
  },
  (t) => [uniqueIndex("card_payouts_club_payout").on(t.clubId, t.payoutId), index("card_payouts_club_id").on(t.clubId)],
);

export const bankStatements = sqliteTable(
  "bank_statements",
  {
    id: id(),
    clubId: clubId(),
    uploadId: text("upload_id").references(() => uploads.id),
    format: text("format", { enum: ["csv", "ofx"] }).notNull(),
    fileName: text("file_name").notNull(),
    mapping: text("mapping", { mode: "json" }).$type<CsvMapping>(),
    /** The file as imported, kept whole: the upload store takes images and PDFs only. */
    sourceText: text("source_text"),
    periodStart: text("period_start").notNull(),
    periodEnd: text("period_end").notNull(),
    closingBalanceMinor: money("closing_balance_minor"),
    currency: text("currency").notNull(),
    lineCount: integer("line_count").notNull(),
    skippedCount: integer("skipped_count").notNull().default(0),
    importedById: text("imported_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [index("bank_statements_club_id").on(t.clubId, t.periodEnd)],
);

export const bankLines = sqliteTable(
  "bank_lines",
  {
    id: id(),
    clubId: clubId(),
    statementId: text("statement_id").notNull().references(() => bankStatements.id),
    lineNo: integer("line_no").notNull(),
    postedOn: text("posted_on").notNull(),
    amountMinor: money("amount_minor"),
    description: text("description").notNull(),
    reference: text("reference"),
    /** The bank's id (OFX FITID) or a digest of the line: the same line is never imported twice. */
    dedupeKey: text("dedupe_key").notNull(),
    ignored: integer("ignored", { mode: "boolean" }).notNull().default(false),
    ...timestamps(),
  },
  (t) => [uniqueIndex("bank_lines_club_dedupe").on(t.clubId, t.dedupeKey), index("bank_lines_club_id").on(t.clubId, t.statementId), index("bank_lines_posted").on(t.clubId, t.postedOn)],
);

/** One row per (bank line, journal line on the bank account) pair; a split has several. */
export const reconciliationMatches = sqliteTable(
  "reconciliation_matches",
  {
    id: id(),
    clubId: clubId(),
    bankLineId: text("bank_line_id").notNull().references(() => bankLines.id),
    journalLineId: text("journal_line_id").notNull().references(() => journalLines.id),
    kind: text("kind", { enum: ["exact", "reference", "payout", "manual", "booked"] }).notNull(),
    /** An entry posted by the match itself (payout received, bank fee): reversed on undo. */
    createdEntryId: text("created_entry_id").references(() => journalEntries.id),
    matchedById: text("matched_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [uniqueIndex("reconciliation_matches_journal_line").on(t.journalLineId), index("reconciliation_matches_club_id").on(t.clubId, t.bankLineId)],
);

/** A reconciled period; once locked, no entry may be dated on or before periodEnd. */
export const reconciliationPeriods = sqliteTable(
  "reconciliation_periods",
  {
    id: id(),
    clubId: clubId(),
    statementId: text("statement_id").notNull().references(() => bankStatements.id),
    periodStart: text("period_start").notNull(),
    periodEnd: text("period_end").notNull(),
    statementBalanceMinor: money("statement_balance_minor"),
    bookBalanceMinor: money("book_balance_minor"),
    depositsInTransitMinor: money("deposits_in_transit_minor"),
    outstandingChequesMinor: money("outstanding_cheques_minor"),
    bankChargesMinor: money("bank_charges_minor"),
    bankCreditsMinor: money("bank_credits_minor"),
    locked: integer("locked", { mode: "boolean" }).notNull().default(true),
    lockedById: text("locked_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [uniqueIndex("reconciliation_periods_statement").on(t.statementId), index("reconciliation_periods_club_id").on(t.clubId, t.periodEnd)],
);

/** The club's money settings: payment terms, late fee, the cap on fuel credits. */
export const moneySettings = sqliteTable(
  "money_settings",
  {
    id: id(),
    clubId: clubId().unique(),
    paymentTermsDays: integer("payment_terms_days").notNull().default(14),
    lateFeeFlatMinor: integer("late_fee_flat_minor").notNull().default(0),
    /** Hundredths of a percent of the overdue balance (150 = 1.5 %). */
    lateFeeBasisPoints: integer("late_fee_basis_points").notNull().default(0),
    /** Most the club credits per gallon or litre of fuel bought away from home. */
    fuelCreditCapPerUnitMinor: integer("fuel_credit_cap_per_unit_minor").notNull().default(0),
    /** A bill above this amount is paid only once a second officer has approved it. */
    billApprovalOverMinor: integer("bill_approval_over_minor").notNull().default(50000),
    ...timestamps(),
  },
);

/** Saved inputs of the hourly-rate calculator, one per aircraft or scenario. */
export const rateProfiles = sqliteTable(
  "rate_profiles",
  {
    id: id(),
    clubId: clubId(),
    name: text("name").notNull(),
    fixedAnnualCostsMinor: money("fixed_annual_costs_minor"),
    expectedHours: integer("expected_hours").notNull(),
    /** Tenths of a gallon or litre per hour (85 = 8.5). */
    fuelBurnTenthsPerHour: integer("fuel_burn_tenths_per_hour").notNull(),
    fuelPriceMinor: money("fuel_price_minor"),
    oilPerHourMinor: money("oil_per_hour_minor"),
    maintenanceReservePerHourMinor: money("maintenance_reserve_per_hour_minor"),
    overhaulCostMinor: money("overhaul_cost_minor"),
    tboHours: integer("tbo_hours").notNull(),
    ...timestamps(),
  },
  (t) => [uniqueIndex("rate_profiles_club_name").on(t.clubId, t.name), index("rate_profiles_club_id").on(t.clubId)],
);

/** Dues reminders sent, at most one per member per day. */
export const duesReminders = sqliteTable(
  "dues_reminders",
  {
    id: id(),
    clubId: clubId(),
    memberUserId: text("member_user_id").notNull().references(() => users.id),
    sentOn: text("sent_on").notNull(),
    balanceMinor: money("balance_minor"),
    ...timestamps(),
  },
  (t) => [uniqueIndex("dues_reminders_once_a_day").on(t.clubId, t.memberUserId, t.sentOn), index("dues_reminders_club_id").on(t.clubId)],
);

export type LedgerAccount = typeof ledgerAccounts.$inferSelect;
export type JournalEntryRow = typeof journalEntries.$inferSelect;
export type JournalLineRow = typeof journalLines.$inferSelect;
export type DuesPlan = typeof duesPlans.$inferSelect;
export type MemberDuesRow = typeof memberDues.$inferSelect;
export type BillingRun = typeof billingRuns.$inferSelect;
export type StatementRow = typeof statements.$inferSelect;
export type PaymentRow = typeof payments.$inferSelect;
export type PaymentRefundRow = typeof paymentRefunds.$inferSelect;
export type CardPayoutRow = typeof cardPayouts.$inferSelect;
export type BankStatementRow = typeof bankStatements.$inferSelect;
export type BankLineRow = typeof bankLines.$inferSelect;
export type ReconciliationMatchRow = typeof reconciliationMatches.$inferSelect;
export type ReconciliationPeriodRow = typeof reconciliationPeriods.$inferSelect;
export type MoneySettingsRow = typeof moneySettings.$inferSelect;
export type RateProfileRow = typeof rateProfiles.$inferSelect;

export const BILL_STATUSES = ["awaiting_approval", "approved", "paid"] as const;
export type BillStatus = (typeof BILL_STATUSES)[number];

/**
 * A bill the club owes a vendor (insurance, hangar rent, a fuel invoice, maintenance). Entering
 * it posts the expense against "Bills to pay"; paying it posts the payment from the bank (matched
 * later in reconciliation). Above the club's approval amount a second officer approves first.
 */
export const bills = sqliteTable(
  "bills",
  {
    id: id(),
    clubId: clubId(),
    vendor: text("vendor").notNull(),
    billDate: text("bill_date").notNull(),
    dueOn: text("due_on").notNull(),
    /** The chart account the bill is booked to (its category). */
    accountCode: text("account_code").notNull(),
    amountMinor: money("amount_minor"),
    currency: text("currency").notNull(),
    reference: text("reference"),
    status: text("status", { enum: BILL_STATUSES }).notNull(),
    enteredById: text("entered_by_id").notNull().references(() => users.id),
    approvedById: text("approved_by_id").references(() => users.id),
    approvedAt: integer("approved_at", { mode: "timestamp_ms" }),
    entryId: text("entry_id").notNull().references(() => journalEntries.id),
    paidOn: text("paid_on"),
    paidById: text("paid_by_id").references(() => users.id),
    paymentEntryId: text("payment_entry_id").references(() => journalEntries.id),
    /** The recurring bill this one was produced from, and its period ("2026-05", "2026-Q2", "2026"). */
    recurringBillId: text("recurring_bill_id").references(() => recurringBills.id),
    periodKey: text("period_key"),
    ...timestamps(),
  },
  (t) => [
    index("bills_club_id").on(t.clubId, t.status, t.dueOn),
    // Once per recurring bill and period, however often the due bills are produced.
    uniqueIndex("bills_recurring_period").on(t.clubId, t.recurringBillId, t.periodKey),
  ],
);
export type BillRow = typeof bills.$inferSelect;

export const RECURRENCE_CADENCES = ["monthly", "quarterly", "yearly"] as const;
export const RECURRENCE_STATUSES = ["active", "paused", "ended"] as const;

/**
 * A bill that comes back (insurance, hangar rent): each period's bill is produced once, through
 * the one bill write path, on or after `nextOn`. `anchorDay` is the day of the month it falls on
 * (a 31st falls on the last day of a shorter month).
 */
export const recurringBills = sqliteTable(
  "recurring_bills",
  {
    id: id(),
    clubId: clubId(),
    vendor: text("vendor").notNull(),
    accountCode: text("account_code").notNull(),
    amountMinor: money("amount_minor"),
    currency: text("currency").notNull(),
    reference: text("reference"),
    cadence: text("cadence", { enum: RECURRENCE_CADENCES }).notNull(),
    anchorDay: integer("anchor_day").notNull(),
    nextOn: text("next_on").notNull(),
    endsOn: text("ends_on"),
    /** Days from the bill's date to its due date. */
    dueDays: integer("due_days").notNull().default(0),
    status: text("status", { enum: RECURRENCE_STATUSES }).notNull().default("active"),
    createdById: text("created_by_id").notNull().references(() => users.id),
    ...timestamps(),
  },
  (t) => [index("recurring_bills_club_id").on(t.clubId, t.status, t.nextOn)],
);
export type RecurringBillRow = typeof recurringBills.$inferSelect;

/** The budget of one income or expense account for one month, on the account's normal side. */
export const budgets = sqliteTable(
  "budgets",
  {
    id: id(),
    clubId: clubId(),
    accountCode: text("account_code").notNull(),
    /** "YYYY-MM". */
    month: text("month").notNull(),
    amountMinor: money("amount_minor"),
    currency: text("currency").notNull(),
    updatedById: text("updated_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [uniqueIndex("budgets_club_account_month").on(t.clubId, t.accountCode, t.month), index("budgets_club_id").on(t.clubId, t.month)],
);
export type BudgetRow = typeof budgets.$inferSelect;

/**
 * A closed year (append-only): its income and expense closed into retained funds by one entry
 * dated the year's last day, and no entry dated on or before that day afterwards.
 */
export const yearCloses = sqliteTable(
  "year_closes",
  {
    id: id(),
    clubId: clubId(),
    year: integer("year").notNull(),
    /** The year's last day (YYYY-12-31): the books are locked through it. */
    closedThrough: text("closed_through").notNull(),
    /** The closing entry; null when the year had no income or expense to close. */
    entryId: text("entry_id").references(() => journalEntries.id),
    netIncomeMinor: integer("net_income_minor").notNull(),
    closedById: text("closed_by_id").notNull().references(() => users.id),
    ...timestamps(),
  },
  (t) => [uniqueIndex("year_closes_club_year").on(t.clubId, t.year)],
);
export type YearCloseRow = typeof yearCloses.$inferSelect;
