import PDFDocument from "pdfkit";
import { formatDate } from "@/lib/dates";
import { DEFAULT_LOCALE, moneyFormatter } from "./format";
import { paperSizeFor } from "./locale";
import type { StatementFigures } from "@/lib/money/statement-lines";

export type StatementPdfInput = {
  clubName: string;
  memberName: string;
  memberEmail: string;
  periodLabel: string;
  currency: string;
  /** The club's locale (BCP 47): amounts, dates and the paper size (Letter or A4) follow it. */
  locale?: string;
  figures: StatementFigures;
  balanceNowMinor: number;
  /** The club's calendar date the statement is issued on (its time zone, never UTC's). */
  generatedOn: string;
};

const INK = "#1d2a33";
const MUTED = "#5b6b73";

/** The statement as a PDF (pdfkit, built-in Helvetica), amounts right-aligned in columns. */
export function renderStatementPdf(input: StatementPdfInput): Promise<Buffer> {
  const locale = input.locale ?? DEFAULT_LOCALE;
  const doc = new PDFDocument({ size: paperSizeFor(locale), margin: 50, info: { Title: `Statement ${input.periodLabel}`, Author: input.clubName, Creator: "Hangarline" } });
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  // The built-in Helvetica is WinAnsi: Intl's narrow no-break space (fr-FR groups, de-CH) becomes
  // the no-break space it has.
  const ansi = (t: string) => t.replace(/\u202f/g, "\u00a0");
  const toMoney = moneyFormatter(input.currency, locale);
  const money = (m: number) => ansi(toMoney(m));
  const day = (d: string) => (d ? ansi(formatDate(d, locale)) : "");
  const f = input.figures;
  const left = 50;
  const width = doc.page.width - 100;
  const cols = { date: left, memo: left + 75, charge: left + 285, credit: left + 365, balance: left + 445 };
  const amountWidth = 70;

  doc.fillColor(MUTED).fontSize(9).text(`HANGARLINE · ${input.clubName.toUpperCase()}`, left, 50);
  doc.fillColor(INK).fontSize(20).text(`Statement for ${input.periodLabel}`, left, 66);
  doc.fontSize(10).fillColor(INK).text(input.memberName, left, 96).fillColor(MUTED).text(input.memberEmail);
  doc.text(`Period ${day(f.periodStart)} to ${day(f.periodEnd)} · issued ${day(input.generatedOn)}`, left, 126);

  let y = 156;
  const header = () => {
    doc.fontSize(9).fillColor(MUTED);
    doc.text("Date", cols.date, y).text("Description", cols.memo, y);
    doc.text("Charge", cols.charge, y, { width: amountWidth, align: "right" });
    doc.text("Credit", cols.credit, y, { width: amountWidth, align: "right" });
    doc.text("Balance", cols.balance, y, { width: amountWidth, align: "right" });
    y += 14;
    doc.moveTo(left, y).lineTo(left + width, y).strokeColor("#d9d4c5").stroke();
    y += 6;
  };
  header();
  const row = (date: string, memo: string, charge: string, credit: string, balance: string) => {
    doc.fontSize(9).fillColor(INK);
    const h = Math.max(12, doc.heightOfString(memo, { width: 200 }));
    if (y + h > doc.page.height - 80) {
      doc.addPage();
      y = 50;
      header();
    }
    doc.text(day(date), cols.date, y).text(memo, cols.memo, y, { width: 200 });
    doc.text(charge, cols.charge, y, { width: amountWidth, align: "right" });
    doc.text(credit, cols.credit, y, { width: amountWidth, align: "right" });
    doc.text(balance, cols.balance, y, { width: amountWidth, align: "right" });
    y += h + 6;
  };
  row(f.periodStart, "Brought forward", "", "", money(f.openingMinor));
  for (const l of f.lines) row(l.date, l.memo, l.chargeMinor ? money(l.chargeMinor) : "", l.creditMinor ? money(l.creditMinor) : "", money(l.balanceMinor));
  if (f.lines.length === 0) row("", "No charges or payments in this period.", "", "", "");

  y += 6;
  doc.moveTo(left, y).lineTo(left + width, y).strokeColor("#d9d4c5").stroke();
  y += 10;
  const total = (label: string, value: string) => {
    doc.fontSize(10).fillColor(INK).text(label, cols.memo, y).text(value, cols.balance - 40, y, { width: amountWidth + 40, align: "right" });
    y += 16;
  };
  total("Charges this period", money(f.chargesMinor));
  total("Payments and credits this period", money(f.creditsMinor));
  total(`Balance at ${day(f.periodEnd)}`, money(f.closingMinor));
  total("Balance today", money(input.balanceNowMinor));
  doc.fontSize(8).fillColor(MUTED).text("A positive balance is owed to the club; a negative balance is a credit in your favour.", left, y + 10, { width });
  doc.end();
  return done;
}
