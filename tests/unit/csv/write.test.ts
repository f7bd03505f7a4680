// The one CSV writer (lib/csv/write.ts, csv-stringify). Sources: RFC 4180 §2 for the format;
// OWASP "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection) for the formula guard:
// cells starting with = + - @, tab (0x09) or carriage return (0x0D) are prefixed with a single quote.
import { describe, expect, it } from "vitest";
import { csvDialect, guardCsvCell, writeCsv } from "@/lib/csv";
import { splitCsvRecords } from "@/lib/reconcile";

describe("writeCsv (RFC 4180)", () => {
  it("separates fields with commas and ends every record with CRLF, the last one too", () => {
    expect(writeCsv(["a", "b"], [["1", 2]])).toBe("a,b\r\n1,2\r\n"); // RFC 4180 §2.1, §2.4
    expect(writeCsv(["h"], [["1"], ["2"]])).toBe("h\r\n1\r\n2\r\n"); // RFC 4180 §2.1, §2.2
  });

  it("quotes fields with a comma, quote or line break and doubles inner quotes", () => {
    expect(writeCsv(["a", "b"], [["x,y", 'say "hi"'], ["two\nlines", 3]])).toBe('a,b\r\n"x,y","say ""hi"""\r\n"two\nlines",3\r\n'); // RFC 4180 §2.6, §2.7
    expect(writeCsv(["m"], [["Pike, Rowan"], [null], [undefined]])).toBe('m\r\n"Pike, Rowan"\r\n\r\n\r\n'); // RFC 4180 §2.6; empty field
  });

  it("round-trips through the importer's reader (csv-parse)", () => {
    const csv = writeCsv(["Date", "Memo", "Amount"], [["2026-04-01", 'Flight "N0512L", 1.3 h', "-197.60"], ["2026-04-02", "two\r\nlines", 12]]);
    expect(splitCsvRecords(csv).map((r) => r.fields)).toEqual([
      ["Date", "Memo", "Amount"],
      ["2026-04-01", 'Flight "N0512L", 1.3 h', "-197.60"],
      ["2026-04-02", "two\nlines", "12"], // RFC 4180 §2.6: a line break inside quotes is data (read as LF)
    ]);
  });
});

describe("guardCsvCell (OWASP CSV Injection)", () => {
  it("prefixes a single quote to cells starting with = + - @ tab or CR", () => {
    expect(guardCsvCell('=HYPERLINK("x")')).toBe(`'=HYPERLINK("x")`); // OWASP CSV Injection: "="
    expect(guardCsvCell("+1+1")).toBe("'+1+1"); // OWASP CSV Injection: "+"
    expect(guardCsvCell("-2+3")).toBe("'-2+3"); // OWASP CSV Injection: "-"
    expect(guardCsvCell("@SUM(A1)")).toBe("'@SUM(A1)"); // OWASP CSV Injection: "@"
    expect(guardCsvCell("\t=1")).toBe("'\t=1"); // OWASP CSV Injection: tab (0x09)
    expect(guardCsvCell("\r=1")).toBe("'\r=1"); // OWASP CSV Injection: carriage return (0x0D)
  });

  it("leaves numbers and plain negative amounts as they are", () => {
    expect(guardCsvCell("-152.00")).toBe("-152.00"); // common practice: a plain number is data, not a formula
    expect(guardCsvCell(-5)).toBe("-5"); // common practice
    expect(guardCsvCell("Hangar rent")).toBe("Hangar rent");
    expect(guardCsvCell(null)).toBe("");
  });

  it("guards every cell of a written document, the header too, and quotes what needs it", () => {
    expect(writeCsv(["=h"], [["=1+2"], ['=HYPERLINK("x")']])).toBe(`'=h\r\n'=1+2\r\n"'=HYPERLINK(""x"")"\r\n`); // OWASP CSV Injection + RFC 4180 §2.7
    expect(writeCsv(["m"], [["-12.50"], ["+1"], ["@x"]])).toBe("m\r\n-12.50\r\n'+1\r\n'@x\r\n");
  });
});

describe("writeCsv in the club's locale", () => {
  it("keeps RFC 4180 commas, '.' decimals and ISO 8601 days without a locale", () => {
    expect(writeCsv(["Day", "Amount"], [[{ day: "2026-12-31" }, { decimal: "-1234.50" }]])).toBe("Day,Amount\r\n2026-12-31,-1234.50\r\n"); // RFC 4180 §2; ISO 8601 calendar date
  });

  it("writes a comma-decimal locale's amounts with its mark and separates fields with semicolons", () => {
    // Decimal comma and day.month.year for de-DE: Unicode CLDR locale data, as Intl gives it.
    // The semicolon between fields where the decimal mark is a comma: common practice (a spreadsheet
    // set to such a locale reads ";" as the list separator).
    expect(csvDialect("de-DE").delimiter).toBe(";");
    expect(writeCsv(["Tag", "Betrag", "Memo"], [[{ day: "2026-12-31" }, { decimal: "-1234.50" }, "Treibstoff; Öl"]], { locale: "de-DE" })).toBe(
      'Tag;Betrag;Memo\r\n31.12.2026;-1234,50;"Treibstoff; Öl"\r\n', // CLDR de: "," decimal, dd.MM.y; RFC 4180 §2.6 quoting (with ";" as the separator)
    );
    expect(writeCsv(["Jour", "Montant"], [[{ day: "2026-04-01" }, { decimal: "12.50" }]], { locale: "fr-FR" })).toBe("Jour;Montant\r\n01/04/2026;12,50\r\n"); // CLDR fr: "," decimal, dd/MM/y
  });

  it("keeps commas for point-decimal locales and writes their numeric day order", () => {
    expect(writeCsv(["Day", "Amount"], [[{ day: "2026-04-01" }, { decimal: "12.50" }]], { locale: "en-US" })).toBe("Day,Amount\r\n04/01/2026,12.50\r\n"); // CLDR en-US: M/d/y
    expect(writeCsv(["Day", "Amount"], [[{ day: "2026-04-01" }, { decimal: "12.50" }]], { locale: "en-GB" })).toBe("Day,Amount\r\n01/04/2026,12.50\r\n"); // CLDR en-GB: dd/MM/y
  });

  it("still guards text cells against formulas, whatever the locale", () => {
    expect(writeCsv(["m"], [["=1+2"], [{ decimal: "=1+2" }]], { locale: "de-DE" })).toBe("m\r\n'=1+2\r\n'=1+2\r\n"); // OWASP CSV Injection
  });
});
