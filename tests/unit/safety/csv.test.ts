import { describe, expect, it } from "vitest";
import { csvField, toCsv } from "@/lib/safety/csv";

describe("toCsv — RFC 4180", () => {
  it("ends every record with CRLF and separates fields with commas (RFC 4180 §2.1, §2.4)", () => {
    expect(toCsv(["a", "b"], [["1", 2]])).toBe("a,b\r\n1,2\r\n");
  });

  it("quotes fields with commas, quotes or line breaks and doubles inner quotes (RFC 4180 §2.6, §2.7)", () => {
    expect(csvField('Pike, Rowan')).toBe('"Pike, Rowan"');
    expect(csvField('say "again"')).toBe('"say ""again"""');
    expect(csvField("two\nlines")).toBe('"two\nlines"');
    expect(csvField(null)).toBe("");
  });

  it("defuses cells a spreadsheet would run as formulas (OWASP CSV injection advice, common practice)", () => {
    expect(csvField("=HYPERLINK(\"x\")")).toBe("\"'=HYPERLINK(\"\"x\"\")\"");
    expect(csvField("+1")).toBe("'+1");
    expect(csvField("@sum")).toBe("'@sum");
    expect(csvField(-3)).toBe("-3"); // a number is data, not a formula
  });
});
