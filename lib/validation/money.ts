import { z } from "zod";
import { calendarDate, calendarMonth, recordId } from "./primitives";
import { filesField } from "./fleet";
import { DUES_PERIODS, MEMBER_CATEGORIES } from "@/lib/money/dues";

// Amounts are typed in major units ("95", "95.50") and turned into minor units of the club's
// currency by the action (lib/actions/money/amounts.ts), which knows the currency.

const text = (label: string, max: number) =>
  z.string({ error: `Enter ${label}.` }).trim().min(1, { error: `Enter ${label}.` }).max(max, { error: `Keep ${label} under ${max} characters.` });

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, { error: `Keep it under ${max} characters.` })
    .optional()
    .transform((v) => (v ? v : undefined));

export const isoDateField = (label: string) => calendarDate(label, `Enter ${label} as a calendar date, like 2026-05-01.`);

export const monthField = calendarMonth("Choose the month, like 2026-05.");

/** A positive amount in major units, at most two decimals. */
export const amountField = (label: string) =>
  z
    .string({ error: `Enter ${label}.` })
    .trim()
    .transform((v) => v.replace(/,/g, ""))
    .pipe(z.string().regex(/^\d{1,9}(\.\d{1,2})?$/, { error: `Enter ${label} as a number, like 95 or 95.50.` }))
    .refine((v) => Number(v) > 0, { error: `${label[0]!.toUpperCase()}${label.slice(1)} must be more than zero.` });

/** Zero or more, for settings. */
export const amountOrZeroField = (label: string) =>
  z
    .string({ error: `Enter ${label}.` })
    .trim()
    .transform((v) => (v === "" ? "0" : v.replace(/,/g, "")))
    .pipe(z.string().regex(/^\d{1,9}(\.\d{1,2})?$/, { error: `Enter ${label} as a number, like 0, 15 or 15.50.` }));

/** A balance as printed on a statement: may be negative (an overdrawn account). */
export const signedAmountField = (label: string) =>
  z
    .string({ error: `Enter ${label}.` })
    .trim()
    .transform((v) => v.replace(/[,\s]/g, "").replace(/^\((.*)\)$/, "-$1"))
    .pipe(z.string().regex(/^-?\d{1,10}(\.\d{1,2})?$/, { error: `Enter ${label} as printed on the statement, like 4210.55 or -12.00.` }));

const id = (what: string) => recordId(`Choose ${what}.`);

const checkbox = z
  .union([z.literal("on"), z.literal("true"), z.literal("false"), z.literal("")])
  .optional()
  .transform((v) => v === "on" || v === "true");

export const billingRunSchema = z.object({ month: monthField });

export const duesPlanSchema = z.object({
  planId: z.string().trim().max(64).optional().transform((v) => v || undefined).pipe(recordId("Choose a plan.").optional()),
  name: text("a name for the plan", 80),
  period: z.enum(DUES_PERIODS, { error: "Choose monthly, quarterly or annual." }),
  category: z.enum(MEMBER_CATEGORIES, { error: "Choose the member category the plan is for." }),
  amount: amountOrZeroField("the amount per period"),
  active: checkbox,
});

export const assignDuesSchema = z.object({
  memberUserId: id("a member"),
  planId: z.string().trim().max(64).optional().transform((v) => v || undefined).pipe(recordId("Choose a plan.").optional()),
  startsOn: isoDateField("the date the plan starts"),
});

export const manualPaymentSchema = z.object({
  memberUserId: id("the member who paid"),
  method: z.enum(["cheque", "cash", "transfer"], { error: "Choose cheque, cash or bank transfer." }),
  amount: amountField("the amount received"),
  receivedOn: isoDateField("the date it was received"),
  reference: optionalText(60),
});

export const refundSchema = z.object({
  paymentId: id("the payment to refund"),
  amount: amountField("the amount to refund"),
  treatment: z.enum(["reopen", "absorb"], { error: "Choose whether the member owes it again or the club bears it." }),
});

export const ADJUSTMENT_ACCOUNTS = ["dues-income", "flight-income", "late-fee-income", "fuel-credits", "refunds"] as const;

export const adjustmentSchema = z.object({
  memberUserId: id("a member"),
  direction: z.enum(["charge", "credit"], { error: "Choose charge or credit." }),
  account: z.enum(ADJUSTMENT_ACCOUNTS, { error: "Choose the account the adjustment belongs to." }),
  amount: amountField("the amount"),
  date: isoDateField("the date"),
  memo: text("what it is for (shown on the statement)", 140),
});

export const reverseEntrySchema = z.object({
  entryId: id("the entry"),
  date: z
    .string()
    .trim()
    .optional()
    .transform((v) => v || undefined)
    .pipe(isoDateField("the date").optional()),
});

export const DATE_FORMATS = ["ISO", "MM/DD/YYYY", "DD/MM/YYYY", "DD.MM.YYYY"] as const;

const column = optionalText(80);

export const bankImportSchema = z
  .object({
    format: z.enum(["csv", "ofx"], { error: "Choose CSV or OFX." }),
    closingBalance: z
      .string()
      .trim()
      .optional()
      .transform((v) => v || undefined)
      .pipe(signedAmountField("the closing balance").optional()),
    periodStart: z.string().trim().optional().transform((v) => v || undefined).pipe(calendarDate("the first day", "Enter the first day as a date, like 2026-04-01.").optional()),
    periodEnd: z.string().trim().optional().transform((v) => v || undefined).pipe(calendarDate("the last day", "Enter the last day as a date, like 2026-04-30.").optional()),
    dateColumn: column,
    amountColumn: column,
    debitColumn: column,
    creditColumn: column,
    descriptionColumn: column,
    referenceColumn: column,
    currencyColumn: column,
    /** For an OFX file holding several accounts: the one to import (its key from the list offered). */
    account: z
      .string()
      .trim()
      .max(40, { error: "Choose one of the accounts found in the file." })
      .regex(/^(\d{1,3}-[^\s]{1,8})?$/, { error: "Choose one of the accounts found in the file." })
      .optional()
      .transform((v) => v || undefined),
    sign: z.enum(["deposits-positive", "deposits-negative"], { error: "Choose how the amount column is signed." }).default("deposits-positive"),
    dateFormat: z.enum(DATE_FORMATS, { error: "Choose the date format of the file." }).default("ISO"),
    delimiter: z.enum([",", ";", "tab"], { error: "Choose the separator." }).default(","),
    decimalComma: checkbox,
  })
  .superRefine((v, ctx) => {
    if (v.format !== "csv") return;
    if (!v.dateColumn) ctx.addIssue({ code: "custom", path: ["dateColumn"], message: "Name the column that holds the date." });
    if (!v.amountColumn && !v.debitColumn && !v.creditColumn) ctx.addIssue({ code: "custom", path: ["amountColumn"], message: "Name the amount column, or the debit and credit columns." });
    if (v.amountColumn && (v.debitColumn || v.creditColumn)) ctx.addIssue({ code: "custom", path: ["amountColumn"], message: "Use either one amount column or debit and credit columns, not both." });
    if (!v.closingBalance) ctx.addIssue({ code: "custom", path: ["closingBalance"], message: "Enter the closing balance printed on the statement (a CSV file does not carry it)." });
  });

export const statementIdSchema = z.object({ statementId: id("a statement") });
/** A mistyped closing balance corrected. */
export const correctStatementSchema = z.object({ statementId: id("a statement"), closingBalance: signedAmountField("the closing balance printed on the statement") });
export const bankLineSchema = z.object({ bankLineId: id("a bank line") });
export const ignoreLineSchema = z.object({ bankLineId: id("a bank line"), ignored: z.enum(["true", "false"]).transform((v) => v === "true") });

export const manualMatchSchema = z.object({
  bankLineId: id("a bank line"),
  bookIds: z
    .union([z.string(), z.array(z.string())], { error: "Choose at least one item from the books." })
    .transform((v) => (Array.isArray(v) ? v : [v]).filter(Boolean))
    .refine((v) => v.length > 0, { error: "Choose at least one item from the books." })
    .refine((v) => v.length <= 200, { error: "Choose at most 200 items from the books at once." })
    .pipe(z.array(z.string().regex(/^(line|payout|pay|ref):[A-Za-z0-9][A-Za-z0-9_-]{0,63}$/, { error: "Choose items from the books." }))),
});


export const bookLineSchema = z.object({
  bankLineId: id("a bank line"),
  // Any account of the club's chart, chosen by the treasurer: there is no default.
  account: z.string({ error: "Choose the account for this bank item." }).trim().min(1, { error: "Choose the account for this bank item." }).max(40, { error: "Choose the account for this bank item." }),
  memo: optionalText(140),
});

const wholeNumber = (label: string, min: number, max: number) =>
  z.coerce
    .number({ error: `Enter ${label} as a whole number.` })
    .int({ error: `Enter ${label} as a whole number.` })
    .min(min, { error: `${label[0]!.toUpperCase()}${label.slice(1)} must be at least ${min}.` })
    .max(max, { error: `${label[0]!.toUpperCase()}${label.slice(1)} must be at most ${max}.` });

export const rateProfileSchema = z.object({
  name: text("a name (an aircraft or a scenario)", 60),
  fixedAnnualCosts: amountOrZeroField("the fixed costs per year"),
  expectedHours: wholeNumber("the hours flown per year", 1, 5000),
  fuelBurn: z
    .string({ error: "Enter the fuel burn per hour." })
    .trim()
    .regex(/^\d{1,3}(\.\d)?$/, { error: "Enter the fuel burn per hour with at most one decimal, like 8.5." }),
  fuelPrice: amountOrZeroField("the fuel price per unit"),
  oilPerHour: amountOrZeroField("the oil cost per hour"),
  maintenanceReserve: amountOrZeroField("the maintenance reserve per hour"),
  overhaulCost: amountOrZeroField("the engine overhaul cost"),
  tboHours: wholeNumber("the engine's TBO in hours", 1, 10000),
});

export const moneySettingsSchema = z.object({
  paymentTermsDays: wholeNumber("the payment terms in days", 0, 120),
  lateFeeFlat: amountOrZeroField("the late fee"),
  lateFeePercent: z
    .string()
    .trim()
    .transform((v) => v || "0")
    .pipe(z.string().regex(/^\d{1,2}(\.\d{1,2})?$/, { error: "Enter the late fee percentage, like 1.5 (or 0)." })),
  fuelCreditCap: amountOrZeroField("the most the club credits per unit of fuel"),
});

export const emailStatementSchema = z.object({ memberUserId: id("a member"), month: monthField });

export const emptySchema = z.object({});

export type BankImportInput = z.output<typeof bankImportSchema>;

export const settleMeterGapSchema = z.object({
  flightId: id("the flight"),
  note: z.string({ error: "Say what was decided: the time charged, or the explanation accepted." }).trim().min(3, { error: "Say in a few words what was decided." }).max(1000, { error: "Keep the note under 1000 characters." }),
});

/** The period of the profit and loss (both days inclusive), from the page's query or the CSV link. */
export const reportPeriodSchema = z
  .object({ from: isoDateField("the first day"), to: isoDateField("the last day") })
  .refine((v) => v.from <= v.to, { path: ["to"], error: "The last day must be on or after the first day." });

/** The day of the balance sheet. */
export const reportAsOfSchema = z.object({ asOf: isoDateField("the day of the balance sheet") });

const ACCOUNT_TYPES = ["asset", "liability", "equity", "income", "expense"] as const;
const chartFields = {
  code: z.string({ error: "Enter the account code." }).trim().toLowerCase().min(1, { error: "Enter the account code." }).max(40, { error: "Keep the code under 40 characters." }),
  name: text("the account name", 80),
  type: z.enum(ACCOUNT_TYPES, { error: "Choose asset, liability, equity, income or expense." }),
  parentCode: z
    .string()
    .trim()
    .max(40, { error: "Choose a parent account from the chart, or none." })
    .optional()
    .transform((v) => (v ? v : null)),
};

/** A new account in the club's chart. */
export const createChartAccountSchema = z.object(chartFields);
/** An account of the chart changed (its code and type only while it has no postings). */
export const updateChartAccountSchema = z.object({ accountId: id("the account"), ...chartFields });
export const deleteChartAccountSchema = z.object({ accountId: id("the account") });

export const enterBillSchema = z
  .object({
    vendor: text("the vendor", 120),
    billDate: isoDateField("the bill's date"),
    dueOn: isoDateField("the due date"),
    accountCode: z.string({ error: "Choose the category." }).trim().min(1, { error: "Choose the category." }).max(40, { error: "Choose the category." }),
    amount: amountField("the amount"),
    reference: optionalText(60).transform((v) => v ?? null),
    attachment: filesField("invoice files", 3),
  })
  .refine((v) => v.dueOn >= v.billDate, { path: ["dueOn"], error: "The due date cannot be before the bill's date." });

export const billIdSchema = z.object({ billId: id("the bill") });

export const payBillSchema = z.object({ billId: id("the bill"), paidOn: isoDateField("the day paid") });

export const billApprovalAmountSchema = z.object({ amount: z.string({ error: "Enter the amount." }).trim().transform((v) => v.replace(/,/g, "")).pipe(z.string().regex(/^\d{1,9}(\.\d{1,2})?$/, { error: "Enter the amount as a number, like 500 or 500.00 (0: every bill needs a second officer)." })) });

/** A recurring bill (insurance, hangar rent): what, how much, how often, from when. */
export const createRecurringBillSchema = z
  .object({
    vendor: text("the vendor", 120),
    accountCode: z.string({ error: "Choose the category." }).trim().min(1, { error: "Choose the category." }).max(40, { error: "Choose the category." }),
    amount: amountField("the amount"),
    reference: optionalText(60).transform((v) => v ?? null),
    cadence: z.enum(["monthly", "quarterly", "yearly"], { error: "Choose how often the bill comes: every month, every three months or every year." }),
    firstOn: isoDateField("the first bill's date"),
    endsOn: z
      .string()
      .trim()
      .optional()
      .transform((v) => (v ? v : null))
      .pipe(isoDateField("the last bill's date").nullable()),
    dueDays: z
      .string()
      .trim()
      .optional()
      .transform((v) => (v ? v : "0"))
      .pipe(z.string().regex(/^\d{1,3}$/, { error: "Enter the days to pay as a whole number from 0 to 365." }))
      .transform(Number)
      .refine((n) => n <= 365, { error: "Enter the days to pay as a whole number from 0 to 365." }),
  })
  .refine((v) => !v.endsOn || v.endsOn >= v.firstOn, { path: ["endsOn"], error: "The last bill's date cannot be before the first." });

export const recurringBillStatusSchema = z.object({
  recurringBillId: id("the recurring bill"),
  status: z.enum(["active", "paused", "ended"], { error: "Choose pause, resume or end." }),
});

const yearField = z
  .string({ error: "Choose the year." })
  .trim()
  .regex(/^\d{4}$/, { error: "Choose the year, like 2026." })
  .transform(Number)
  .refine((y) => y >= 1900 && y <= 2200, { error: "Choose a year between 1900 and 2200." });

/** A year's budget grid: `b.<account code>.<MM>` cells (typed amounts, blank for none) beside the year. */
export const saveBudgetSchema = z
  .object({ year: yearField })
  .catchall(z.string().max(20, { error: "Enter an amount, like 250 or 250.00." }));

export const BUDGET_CELL = /^b\.([a-z0-9][a-z0-9-]{1,39})\.(0[1-9]|1[0-2])$/;

export const closeYearSchema = z.object({ year: yearField });
