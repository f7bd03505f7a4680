// Sources: ISO 4217 minor-unit exponents (USD 2, EUR 2, JPY 0), from memory; display via the
// ECMA-402 Intl.NumberFormat currency style.
// The cached formatter used for thousands of statements must print exactly what formatMoney
// (lib/money) prints; ISO 4217 minor units: USD and EUR 2 digits, JPY 0.
import { describe, expect, it } from "vitest";
import { moneyFormatter } from "@/lib/money/format";
import { formatMoney } from "@/lib/money";

describe("moneyFormatter", () => {
  it("agrees with formatMoney for every currency and sign", () => {
    for (const currency of ["USD", "EUR", "JPY"]) {
      const f = moneyFormatter(currency);
      for (const minor of [0, 5, -5, 12345, -9950, 987654321]) expect(f(minor)).toBe(formatMoney(minor, currency));
    }
    expect(moneyFormatter("EUR")(123456)).toBe("€1,234.56");
    expect(moneyFormatter("EUR", "de-DE")(123456)).toBe(formatMoney(123456, "EUR", "de-DE"));
  });
});
