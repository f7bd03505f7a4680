// Paper sizes: US Letter in the United States, Canada, Mexico and a few countries that follow
// them, ISO 216 A4 elsewhere (common practice; the CLDR paper-size preference agrees).
import { describe, expect, it } from "vitest";
import { paperSizeFor } from "@/lib/money/paper-size";

describe("paperSizeFor", () => {
  it("follows the locale's region when there is one", () => {
    expect(paperSizeFor({ locale: "en-US", currency: "EUR" })).toBe("LETTER"); // US Letter (common practice)
    expect(paperSizeFor({ locale: "fr-CA", currency: "CAD" })).toBe("LETTER"); // Canada uses Letter (common practice)
    expect(paperSizeFor({ locale: "en-GB", currency: "USD" })).toBe("A4"); // ISO 216 A4 (common practice)
    expect(paperSizeFor({ locale: "de-DE", currency: "EUR" })).toBe("A4"); // ISO 216 A4 (common practice)
  });
  it("without a locale, a club keeping its books in US dollars is a US club", () => {
    expect(paperSizeFor({ currency: "USD" })).toBe("LETTER"); // common practice
    expect(paperSizeFor({ locale: null, currency: "EUR" })).toBe("A4"); // common practice
    expect(paperSizeFor({ locale: "en", currency: "USD" })).toBe("LETTER"); // no region in the locale: the currency decides (common practice)
  });
});
