// Sources: ISO 216 (A4 is 210 × 297 mm), ANSI/ASME Y14.1 (size A, US Letter, is 8.5 × 11 in), and
// ISO 32000-1 (PDF user space: 72 units per inch), which turn them into the MediaBox values below.
import { describe, expect, it } from "vitest";
import { renderStatementPdf } from "@/lib/money/statement-pdf";

const figures = {
  periodStart: "2026-11-01",
  periodEnd: "2026-11-30",
  openingMinor: 0,
  lines: [{ entryId: "e1", date: "2026-11-30", memo: "Dues", chargeMinor: 289306, creditMinor: 0, balanceMinor: 289306 }],
  chargesMinor: 289306,
  creditsMinor: 0,
  closingMinor: 289306,
};
const input = { clubName: "Invented Club", memberName: "Test Member", memberEmail: "member@example.test", periodLabel: "November 2026", currency: "EUR", figures, balanceNowMinor: 289306, generatedOn: "2026-12-01" };

function mediaBox(pdf: Buffer): string {
  return /\/MediaBox \[([^\]]+)\]/.exec(pdf.toString("latin1"))?.[1]?.trim() ?? "";
}

describe("statement PDF paper", () => {
  it("is US Letter for a US club and A4 for a German one", async () => {
    expect(mediaBox(await renderStatementPdf({ ...input, currency: "USD", locale: "en-US" }))).toBe("0 0 612 792"); // ANSI/ASME Y14.1 size A: 8.5 × 11 in at 72 pt/in
    expect(mediaBox(await renderStatementPdf({ ...input, locale: "de-DE" }))).toBe("0 0 595.28 841.89"); // ISO 216 A4: 210 × 297 mm at 72 pt/in
  });
});
