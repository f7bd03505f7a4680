import { describe, expect, it } from "vitest";
import { parseAmountText, parseDateText } from "@/lib/reconcile";

// Amount styles seen on bank exports (common practice): thousands separators, accounting
// parentheses for negatives, trailing minus, currency marks, decimal comma in Europe.
describe("parseAmountText", () => {
  it("reads plain and grouped amounts into minor units", () => {
    expect(parseAmountText("12.50")).toBe(1250);
    expect(parseAmountText("-12.5")).toBe(-1250);
    expect(parseAmountText("1,234,567.89")).toBe(123456789);
    expect(parseAmountText("+7")).toBe(700);
    expect(parseAmountText(".05")).toBe(5);
  });
  it("reads negatives written in parentheses, with a trailing minus or a currency sign", () => {
    expect(parseAmountText("(1,234.56)")).toBe(-123456);
    expect(parseAmountText("12.50-")).toBe(-1250);
    expect(parseAmountText("-$12.50")).toBe(-1250);
    expect(parseAmountText("$(12.50)")).toBe(-1250);
    expect(parseAmountText("USD 1,000.00")).toBe(100000);
  });
  it("reads a decimal comma for European banks", () => {
    expect(parseAmountText("1.234,56", { decimalComma: true })).toBe(123456);
    expect(parseAmountText("-1 234,56 €", { decimalComma: true })).toBe(-123456);
    expect(parseAmountText("12,5", { decimalComma: true })).toBe(1250);
  });
  it("uses the currency's exponent", () => {
    expect(parseAmountText("1,234", { exponent: 0 })).toBe(1234); // JPY: ISO 4217 exponent 0 (from memory)
    expect(parseAmountText("1.234", { exponent: 3 })).toBe(1234); // KWD: exponent 3 (from memory)
  });
  it("refuses what it cannot read exactly", () => {
    expect(() => parseAmountText("12,50")).toThrow(/decimal-comma/); // a decimal comma without the option
    expect(() => parseAmountText("12.345")).toThrow(/decimals/); // a fraction of a cent
    expect(() => parseAmountText("")).toThrow();
    expect(() => parseAmountText("twelve")).toThrow();
    expect(() => parseAmountText("1.2.3")).toThrow();
    expect(parseAmountText("12.5000")).toBe(1250); // trailing zeros are not a fraction of a cent
  });
});

describe("parseDateText", () => {
  it("reads each supported format into an ISO date", () => {
    expect(parseDateText("2025-03-04")).toBe("2025-03-04");
    expect(parseDateText("2025-03-04T10:22:00Z")).toBe("2025-03-04");
    expect(parseDateText("03/04/2025", "MM/DD/YYYY")).toBe("2025-03-04");
    expect(parseDateText("03/04/2025", "DD/MM/YYYY")).toBe("2025-04-03");
    expect(parseDateText("4.3.2025", "DD.MM.YYYY")).toBe("2025-03-04");
  });
  it("refuses impossible dates (Gregorian calendar)", () => {
    expect(() => parseDateText("02/29/2025", "MM/DD/YYYY")).toThrow(); // 2025 is not a leap year
    expect(parseDateText("02/29/2024", "MM/DD/YYYY")).toBe("2024-02-29"); // 2024 is
    expect(() => parseDateText("13/01/2025", "MM/DD/YYYY")).toThrow();
    expect(() => parseDateText("2025/01/02")).toThrow();
  });
});
