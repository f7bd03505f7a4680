// Sources: RFC 4180 (quoting, doubled quotes, CRLF); the OWASP "CSV injection" advice for the
// leading-apostrophe guard (common practice).
import { describe, expect, it } from "vitest";
import { guardCsvCell, writeCsv } from "@/lib/money/csv";

describe("writeCsv", () => {
  it("quotes fields with a comma, quote or line break and doubles quotes (RFC 4180 §2.6, §2.7)", () => {
    expect(writeCsv(["a", "b"], [["x,y", 'say "hi"'], ["two\nlines", 3]])).toBe('a,b\r\n"x,y","say ""hi"""\r\n"two\nlines",3\r\n');
  });

  it("ends every record with CRLF (RFC 4180 §2.1)", () => {
    expect(writeCsv(["h"], [["1"], ["2"]])).toBe("h\r\n1\r\n2\r\n");
  });

  it("neutralises spreadsheet formulas but keeps plain numbers (OWASP CSV injection, common practice)", () => {
    expect(guardCsvCell("=HYPERLINK(\"x\")")).toBe("'=HYPERLINK(\"x\")");
    expect(guardCsvCell("+1+1")).toBe("'+1+1");
    expect(guardCsvCell("@SUM(A1)")).toBe("'@SUM(A1)");
    expect(guardCsvCell("-152.00")).toBe("-152.00");
    expect(guardCsvCell(-5)).toBe("-5");
    expect(guardCsvCell(null)).toBe("");
    expect(writeCsv(["memo"], [["=1+2"]])).toBe("memo\r\n'=1+2\r\n");
  });
});
