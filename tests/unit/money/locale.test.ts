import { describe, expect, it } from "vitest";
import { formatDate, formatMonth } from "@/lib/dates";
import { clubMoney, formatMoney, formatNumber, moneyFormatter } from "@/lib/money/format";
import { CLUB_LOCALES, defaultLocaleFor, isClubLocale, paperSizeFor, regionOf } from "@/lib/money/locale";
import { monthLabel } from "@/lib/money/months";
import { fuelDensityNote } from "@/lib/performance";

// Output shapes are the CLDR conventions as the runtime's ECMA-402 Intl.NumberFormat and
// Intl.DateTimeFormat render them (Node's full ICU); the separators are CLDR's.
describe("money in the club's locale", () => {
  it("writes the euro club's amount the way its members do", () => {
    expect(formatMoney(289306, "EUR", "de-DE")).toBe("2.893,06\u00a0€"); // ECMA-402 Intl.NumberFormat, CLDR de: "." groups, "," decimals, € after a no-break space
    expect(formatMoney(289306, "EUR", "fr-FR")).toBe("2\u202f893,06\u00a0€"); // ECMA-402 Intl.NumberFormat, CLDR fr: narrow no-break space groups
    expect(formatMoney(289306, "EUR", "en-IE")).toBe("€2,893.06"); // ECMA-402 Intl.NumberFormat, CLDR en-IE
    expect(formatMoney(289306, "USD", "en-US")).toBe("$2,893.06"); // ECMA-402 Intl.NumberFormat, CLDR en-US
    expect(formatMoney(-1250, "CHF", "de-CH")).toBe("CHF-12.50"); // ECMA-402 Intl.NumberFormat, CLDR de-CH: sign after the code
  });
  it("gives the same text through the kept formatter and the club helper", () => {
    expect(moneyFormatter("EUR", "de-DE")(289306)).toBe(formatMoney(289306, "EUR", "de-DE")); // same ECMA-402 Intl.NumberFormat options
    expect(clubMoney({ currency: "EUR", locale: "de-DE" })(289306)).toBe("2.893,06\u00a0€"); // ECMA-402 Intl.NumberFormat
    expect(clubMoney({ currency: "USD", locale: null })(289306)).toBe("$2,893.06"); // no locale: en-US (ECMA-402 Intl.NumberFormat)
  });
  it("formats plain numbers with the locale's separators", () => {
    expect(formatNumber(1234.56, "en-US")).toBe("1,234.6"); // ECMA-402 Intl.NumberFormat, one decimal
    expect(formatNumber(1234.56, "de-DE")).toBe("1.234,6"); // ECMA-402 Intl.NumberFormat, CLDR de
    expect(formatNumber(0.71895, "de-DE", { minimumFractionDigits: 2, maximumFractionDigits: 2 })).toBe("0,72"); // ECMA-402 Intl.NumberFormat, half-expand rounding
  });
});

describe("dates in the club's locale", () => {
  it("writes a calendar date as that day whatever the runtime's time zone", () => {
    expect(formatDate("2026-12-01", "en-US")).toBe("Dec 1, 2026"); // ECMA-402 Intl.DateTimeFormat dateStyle medium, CLDR en-US
    expect(formatDate("2026-12-01", "de-DE")).toBe("01.12.2026"); // ECMA-402 Intl.DateTimeFormat dateStyle medium, CLDR de
    expect(formatDate("2026-12-01", "fr-FR")).toBe("1 déc. 2026"); // ECMA-402 Intl.DateTimeFormat dateStyle medium, CLDR fr
    expect(formatDate("2026-01-01", "en-GB", "short")).toBe("01/01/2026"); // ECMA-402 Intl.DateTimeFormat dateStyle short, CLDR en-GB
  });
  it("names the month in the locale", () => {
    expect(formatMonth("2026-04", "en-US")).toBe("April 2026"); // ECMA-402 Intl.DateTimeFormat, CLDR en
    expect(formatMonth("2026-03", "de-DE")).toBe("März 2026"); // ECMA-402 Intl.DateTimeFormat, CLDR de
    expect(monthLabel("2026-04", "fr-FR")).toBe("avril 2026"); // ECMA-402 Intl.DateTimeFormat, CLDR fr
    expect(monthLabel("2026-04")).toBe("April 2026"); // default en-US (ECMA-402 Intl.DateTimeFormat)
    expect(() => formatMonth("2026-4", "en-US")).toThrow(RangeError);
  });
});

describe("the club's locale", () => {
  it("starts from the currency, and for the euro from the time zone", () => {
    expect(defaultLocaleFor("USD", "America/Denver")).toBe("en-US"); // common practice
    expect(defaultLocaleFor("EUR", "Europe/Berlin")).toBe("de-DE"); // common practice
    expect(defaultLocaleFor("EUR", "Europe/Paris")).toBe("fr-FR"); // common practice
    expect(defaultLocaleFor("cad", "America/Edmonton")).toBe("en-CA"); // common practice
    expect(defaultLocaleFor("XTS", "UTC")).toBe("en-US"); // unknown currency: the default (common practice)
  });
  it("offers only tags the runtime can format", () => {
    for (const l of CLUB_LOCALES) expect(Intl.NumberFormat.supportedLocalesOf([l.tag])).toEqual([l.tag]); // ECMA-402 supportedLocalesOf
    expect(isClubLocale("de-DE")).toBe(true);
    expect(isClubLocale("xx-YY")).toBe(false);
    expect(regionOf("de")).toBe("DE"); // Intl.Locale maximize (Unicode likely subtags)
  });
  it("prints on Letter in the US, Canada and Mexico and on A4 elsewhere", () => {
    expect(paperSizeFor("en-US")).toBe("LETTER"); // ANSI/ASME Y14.1 size A, 8.5 × 11 in
    expect(paperSizeFor("en-CA")).toBe("LETTER"); // ANSI/ASME Y14.1 size A (Canada's everyday paper, common practice)
    expect(paperSizeFor("fr-CA")).toBe("LETTER"); // ANSI/ASME Y14.1 size A (common practice)
    expect(paperSizeFor("es-MX")).toBe("LETTER"); // ANSI/ASME Y14.1 size A (common practice)
    expect(paperSizeFor("de-DE")).toBe("A4"); // ISO 216 A4, 210 × 297 mm
    expect(paperSizeFor("en-GB")).toBe("A4"); // ISO 216 A4
    expect(paperSizeFor("en-IE")).toBe("A4"); // ISO 216 A4
    expect(paperSizeFor("fr-FR")).toBe("A4"); // ISO 216 A4
    expect(paperSizeFor("not a tag")).toBe("A4"); // ISO 216 A4 where the region is unknown
  });
});

describe("fuel-weight notes follow the club's units", () => {
  it("says pounds per US gallon to an imperial club and kilograms per litre to a metric one", () => {
    expect(fuelDensityNote("avgas", "imperial", "en-US")).toBe("6 lb per US gallon"); // FAA-H-8083-25 standard avgas weight
    expect(fuelDensityNote("jet", "imperial", "en-US")).toBe("6.7 lb per US gallon"); // FAA-H-8083-25 standard jet fuel weight
    // 6 lb × 0.45359237 kg/lb ÷ 3.785411784 L/US gal = 0.719 kg/L (exact conversion factors, FAA-H-8083-25 weight)
    expect(fuelDensityNote("avgas", "metric", "de-DE")).toBe("0,72 kg per litre");
    // 6.7 lb × 0.45359237 ÷ 3.785411784 = 0.803 kg/L (FAA-H-8083-25 weight)
    expect(fuelDensityNote("jet", "metric", "en-GB")).toBe("0.80 kg per litre");
  });
});
