// The treasurer's reports over the demo club's real journal: the balance sheet balances, the
// profit and loss agrees with the journal lines it summarises, CSV export needs "export", and a
// member reads neither.
import { and, eq, gte, lte } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as reportsRoute } from "@/app/api/clubs/[club]/money/reports/route";
import { GET as journalRoute } from "@/app/api/clubs/[club]/money/journal/route";
import { journalEntries, journalLines, ledgerAccounts } from "@/db/schema";
import { clubBySlug, db, signInAs } from "./helpers";
import { callRoute } from "./fleet-helpers";
import { seedScenario } from "./bookings-helpers";

const SLUG = "reedwater";

describe("profit and loss and balance sheet over the journal", () => {
  beforeAll(async () => {
    await seedScenario();
  });

  it("the balance sheet balances on the demo books, today and at a past day", async () => {
    signInAs("treasurer@hangarline.test");
    for (const asOf of ["2026-12-31", "2026-06-30"]) {
      const res = await callRoute(reportsRoute, `/api/clubs/${SLUG}/money/reports?report=balance-sheet&asOf=${asOf}`, { club: SLUG });
      expect(res.status).toBe(200);
      const body = res.body as { assetsMinor: number; liabilitiesMinor: number; equityMinor: number; balanced: boolean };
      // assets = liabilities + equity (standard accounting practice)
      expect(body.balanced).toBe(true);
      expect(body.assetsMinor).toBe(body.liabilitiesMinor + body.equityMinor);
    }
  });

  it("the profit and loss equals the income and expense lines of the journal in the period", async () => {
    signInAs("treasurer@hangarline.test");
    const club = clubBySlug(SLUG);
    const [from, to] = ["2026-01-01", "2026-12-31"];
    const lines = db()
      .select({ type: ledgerAccounts.type, debit: journalLines.debitMinor, credit: journalLines.creditMinor })
      .from(journalLines)
      .innerJoin(journalEntries, eq(journalEntries.id, journalLines.entryId))
      .innerJoin(ledgerAccounts, eq(ledgerAccounts.id, journalLines.accountId))
      .where(and(eq(journalLines.clubId, club.id), gte(journalEntries.entryDate, from), lte(journalEntries.entryDate, to)))
      .all();
    // Income credit-normal, expense debit-normal (standard accounting practice)
    const income = lines.filter((l) => l.type === "income").reduce((s, l) => s + l.credit - l.debit, 0);
    const expense = lines.filter((l) => l.type === "expense").reduce((s, l) => s + l.debit - l.credit, 0);
    expect(income).toBeGreaterThan(0);
    const res = await callRoute(reportsRoute, `/api/clubs/${SLUG}/money/reports?report=profit-and-loss&from=${from}&to=${to}`, { club: SLUG });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ incomeMinor: income, expenseMinor: expense, netMinor: income - expense });
  });

  it("exports CSV for the treasurer, refuses a reversed period and a member", async () => {
    signInAs("treasurer@hangarline.test");
    const csv = await callRoute(reportsRoute, `/api/clubs/${SLUG}/money/reports?report=profit-and-loss&from=2026-01-01&to=2026-12-31&format=csv`, { club: SLUG });
    expect(csv.status).toBe(200);
    const text = Buffer.from(csv.body as ArrayBuffer).toString("utf8");
    expect(text.split("\r\n")[0]).toBe("Section,Account code,Account,Amount (USD)");
    expect(text).toMatch(/Total,,Net \(income − expenses\),-?\d+\.\d{2}\r\n$/);
    const sheet = await callRoute(reportsRoute, `/api/clubs/${SLUG}/money/reports?report=balance-sheet&asOf=2026-12-31&format=csv`, { club: SLUG });
    expect(Buffer.from(sheet.body as ArrayBuffer).toString("utf8")).toMatch(/Check,,Balanced,0\.00\r\n$/);

    const reversed = await callRoute(reportsRoute, `/api/clubs/${SLUG}/money/reports?report=profit-and-loss&from=2026-02-01&to=2026-01-01`, { club: SLUG });
    expect(reversed.status).toBe(400);
    expect(JSON.stringify(reversed.body)).toMatch(/on or after the first day/);

    signInAs("member@hangarline.test");
    const member = await callRoute(reportsRoute, `/api/clubs/${SLUG}/money/reports?report=balance-sheet&asOf=2026-12-31`, { club: SLUG });
    expect(member.status).toBe(403);
  });

  it("exports in the club's locale: a de-DE club gets semicolons, decimal commas and its day order", async () => {
    signInAs("silberau.admin@hangarline.test");
    const csv = await callRoute(reportsRoute, `/api/clubs/aeroclub-silberau/money/reports?report=balance-sheet&asOf=2026-12-31&format=csv`, { club: "aeroclub-silberau" });
    expect(csv.status).toBe(200);
    const text = Buffer.from(csv.body as ArrayBuffer).toString("utf8");
    // CLDR de: "," decimal mark; ";" between fields where the decimal mark is a comma (common practice).
    expect(text.split("\r\n")[0]).toBe("Section;Account code;Account;Amount (EUR)");
    expect(text).toMatch(/Check;;Balanced;0,00\r\n$/);
    expect(text).not.toMatch(/\d\.\d{2}(;|\r\n)/);
    const pnl = await callRoute(reportsRoute, `/api/clubs/aeroclub-silberau/money/reports?report=profit-and-loss&from=2026-01-01&to=2026-12-31&format=csv`, { club: "aeroclub-silberau" });
    expect(Buffer.from(pnl.body as ArrayBuffer).toString("utf8")).toMatch(/Total;;Net \(income − expenses\);-?\d+,\d{2}\r\n$/);
    const journal = await callRoute(journalRoute, `/api/clubs/aeroclub-silberau/money/journal?format=csv`, { club: "aeroclub-silberau" });
    const lines = Buffer.from(journal.body as ArrayBuffer).toString("utf8").split("\r\n").filter(Boolean);
    expect(lines[0]).toBe("Date;Entry;Kind;Memo;Reference;Account code;Account;Debit;Credit;Currency");
    expect(lines.length).toBeGreaterThan(1);
    for (const line of lines.slice(1)) expect(line).toMatch(/^\d{2}\.\d{2}\.\d{4};/); // CLDR de: dd.MM.y
  });
});
