import { describe, expect, it } from "vitest";
import { currencyExponent, formatMoney, minorToDecimalString, toMinorUnits } from "@/lib/money";

// Minor-unit exponents are ISO 4217's (from memory: USD 2, EUR 2, JPY 0, KWD 3), read from the
// runtime's Intl data; output shapes are the CLDR locale conventions as Intl renders them.
describe("currencyExponent", () => {
  it("knows the minor unit of each currency", () => {
    expect(currencyExponent("USD")).toBe(2); // ISO 4217 (from memory)
    expect(currencyExponent("eur")).toBe(2); // ISO 4217 (from memory)
    expect(currencyExponent("JPY")).toBe(0); // ISO 4217: the yen has no minor unit (from memory)
    expect(currencyExponent("KWD")).toBe(3); // ISO 4217: 1000 fils (from memory)
    expect(() => currencyExponent("US")).toThrow(RangeError);
  });
});

describe("formatMoney", () => {
  it("formats minor units with the currency's exponent", () => {
    expect(formatMoney(123456, "USD", "en-US")).toBe("$1,234.56");
    expect(formatMoney(-1250, "USD", "en-US")).toBe("-$12.50");
    expect(formatMoney(1234, "JPY", "en-US")).toBe("¥1,234"); // exponent 0: 1234 minor = ¥1,234
    expect(formatMoney(123456, "EUR", "de-DE")).toBe("1.234,56\u00a0€"); // CLDR de: no-break space before €
    expect(formatMoney(5, "USD")).toBe("$0.05");
  });
  it("keeps large balances exact", () => {
    expect(formatMoney(900719925474099, "USD", "en-US")).toBe("$9,007,199,254,740.99");
  });
});

describe("minor-unit conversions", () => {
  it("writes minor units as an exact decimal", () => {
    expect(minorToDecimalString(-1234, 2)).toBe("-12.34");
    expect(minorToDecimalString(5, 2)).toBe("0.05");
    expect(minorToDecimalString(1234, 0)).toBe("1234");
    expect(minorToDecimalString(1, 3)).toBe("0.001");
  });
  it("reads major units and refuses fractions of the minor unit", () => {
    expect(toMinorUnits("12.5", "USD")).toBe(1250);
    expect(toMinorUnits(0.1, "USD")).toBe(10);
    expect(toMinorUnits("-3.10", "EUR")).toBe(-310);
    expect(toMinorUnits("1200", "JPY")).toBe(1200);
    expect(toMinorUnits("12.500", "USD")).toBe(1250); // trailing zeros are fine
    expect(() => toMinorUnits("12.345", "USD")).toThrow(RangeError);
    expect(() => toMinorUnits("abc", "USD")).toThrow(RangeError);
  });
});
