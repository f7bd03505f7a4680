// The money forms' zod schemas: one specific message per field, amounts as typed.
import { describe, expect, it } from "vitest";
import { adjustmentSchema, bankImportSchema, billingRunSchema, manualPaymentSchema, moneySettingsSchema, rateProfileSchema } from "@/lib/validation/money";

const fieldsOf = (r: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  Object.fromEntries((r.error?.issues ?? []).map((i) => [i.path.join("."), i.message]));

describe("money schemas", () => {
  it("reads a month and refuses a thirteenth one", () => {
    expect(billingRunSchema.parse({ month: "2026-05" })).toEqual({ month: "2026-05" });
    expect(fieldsOf(billingRunSchema.safeParse({ month: "2026-13" }))).toEqual({ month: "Choose the month, like 2026-05." });
  });
  it("says which payment field is wrong", () => {
    const r = manualPaymentSchema.safeParse({ memberUserId: "", method: "barter", amount: "12.345", receivedOn: "2026-02-30" });
    expect(fieldsOf(r)).toEqual({
      memberUserId: "Choose the member who paid.",
      method: "Choose cheque, cash or bank transfer.",
      amount: "Enter the amount received as a number, like 95 or 95.50.",
      receivedOn: "Enter the date it was received as a calendar date, like 2026-05-01.",
    });
    expect(manualPaymentSchema.parse({ memberUserId: "u", method: "cheque", amount: "1,250.50", receivedOn: "2026-02-28" }).amount).toBe("1250.50");
    expect(fieldsOf(manualPaymentSchema.safeParse({ memberUserId: "u", method: "cash", amount: "0", receivedOn: "2026-02-28" }))).toEqual({ amount: "The amount received must be more than zero." });
  });
  it("needs the CSV columns and the closing balance, but not for OFX", () => {
    expect(fieldsOf(bankImportSchema.safeParse({ format: "csv", dateColumn: "", amountColumn: "", closingBalance: "" }))).toEqual({
      dateColumn: "Name the column that holds the date.",
      amountColumn: "Name the amount column, or the debit and credit columns.",
      closingBalance: "Enter the closing balance printed on the statement (a CSV file does not carry it).",
    });
    expect(bankImportSchema.safeParse({ format: "ofx" }).success).toBe(true);
    expect(bankImportSchema.parse({ format: "csv", dateColumn: "Date", debitColumn: "Out", creditColumn: "In", closingBalance: "(12.00)" }).closingBalance).toBe("-12.00");
  });
  it("checks adjustments, settings and the rate calculator", () => {
    expect(fieldsOf(adjustmentSchema.safeParse({ memberUserId: "u", direction: "gift", account: "bank", amount: "5", date: "2026-01-01", memo: "" }))).toMatchObject({
      direction: "Choose charge or credit.",
      account: "Choose the account the adjustment belongs to.",
      memo: "Enter what it is for (shown on the statement).",
    });
    expect(fieldsOf(moneySettingsSchema.safeParse({ paymentTermsDays: "200", lateFeeFlat: "", lateFeePercent: "150", fuelCreditCap: "6.40" }))).toEqual({
      paymentTermsDays: "The payment terms in days must be at most 120.",
      lateFeePercent: "Enter the late fee percentage, like 1.5 (or 0).",
    });
    expect(fieldsOf(rateProfileSchema.safeParse({ name: "N0512L", fixedAnnualCosts: "18000", expectedHours: "0", fuelBurn: "8.55", fuelPrice: "6.60", oilPerHour: "1.50", maintenanceReserve: "12", overhaulCost: "30000", tboHours: "2000" }))).toEqual({
      expectedHours: "The hours flown per year must be at least 1.",
      fuelBurn: "Enter the fuel burn per hour with at most one decimal, like 8.5.",
    });
  });
});
