import PDFDocument from "pdfkit";
import { formatMoney } from "@/lib/money";
import type { PaperSize } from "@/lib/money/locale";
import type { ReportLine } from "@/lib/money/reports";

// The treasurer's reports as PDF (pdfkit, built-in Helvetica — nothing fetched), the same
// figures as the pages and the CSV: sections of account lines, then totals. The paper size comes
// from the caller (paperSizeFor in lib/money/locale.ts decides it from the club's locale).

export type ReportPdfInput = {
  clubName: string;
  title: string;
  subtitle: string;
  currency: string;
  paper: PaperSize;
  sections: { heading: string; lines: ReportLine[]; empty: string }[];
  totals: { label: string; minor: number; strong?: boolean }[];
  note?: string;
  generatedOn: string;
};

const INK = "#1d2a33";
const MUTED = "#5b6b73";
const RULE = "#d9d4c5";

export function renderReportPdf(input: ReportPdfInput): Promise<Buffer> {
  const doc = new PDFDocument({ size: input.paper, margin: 50, info: { Title: `${input.title} ${input.subtitle}`, Author: input.clubName, Creator: "Hangarline" } });
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  const money = (m: number) => formatMoney(m, input.currency);
  const left = 50;
  const width = doc.page.width - 100;
  const amountWidth = 110;
  const amountX = left + width - amountWidth;
  const bottom = doc.page.height - 70;

  doc.fillColor(MUTED).fontSize(9).text(`HANGARLINE · ${input.clubName.toUpperCase()}`, left, 50);
  doc.fillColor(INK).fontSize(20).text(input.title, left, 66);
  doc.fontSize(10).fillColor(MUTED).text(`${input.subtitle} · amounts in ${input.currency} · printed ${input.generatedOn}`, left, 94);
  let y = 124;
  const room = (h: number) => {
    if (y + h > bottom) {
      doc.addPage();
      y = 50;
    }
  };
  const rule = () => {
    doc.moveTo(left, y).lineTo(left + width, y).strokeColor(RULE).stroke();
    y += 6;
  };
  for (const section of input.sections) {
    room(40);
    doc.fontSize(11).fillColor(INK).font("Helvetica-Bold").text(section.heading, left, y);
    doc.font("Helvetica");
    y += 16;
    rule();
    if (section.lines.length === 0) {
      doc.fontSize(9).fillColor(MUTED).text(section.empty, left, y);
      y += 16;
    }
    for (const l of section.lines) {
      doc.fontSize(9);
      const h = Math.max(12, doc.heightOfString(l.name, { width: width - amountWidth - 110 }));
      room(h + 4);
      doc.fillColor(MUTED).text(l.code, left, y, { width: 100 });
      doc.fillColor(INK).text(l.name, left + 105, y, { width: width - amountWidth - 110 });
      doc.text(money(l.amountMinor), amountX, y, { width: amountWidth, align: "right" });
      y += h + 4;
    }
    y += 8;
  }
  room(20 + input.totals.length * 16);
  rule();
  for (const t of input.totals) {
    doc.fontSize(10).fillColor(INK).font(t.strong ? "Helvetica-Bold" : "Helvetica");
    doc.text(t.label, left + 105, y).text(money(t.minor), amountX, y, { width: amountWidth, align: "right" });
    y += 16;
  }
  doc.font("Helvetica");
  if (input.note) {
    room(30);
    doc.fontSize(8).fillColor(MUTED).text(input.note, left, y + 8, { width });
  }
  doc.end();
  return done;
}
