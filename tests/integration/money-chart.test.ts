// The chart of accounts per club: seeded with the flying-club categories, edited by the
// treasurer only, accounts in use protected; an unknown bank line is booked to the account the
// treasurer chooses, never to a default.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { bankLines, journalEntries, journalLines, ledgerAccounts } from "@/db/schema";
import { listChart } from "@/db/queries/money-chart";
import { createChartAccountAction } from "@/lib/actions/money/create-chart-account";
import { deleteChartAccountAction } from "@/lib/actions/money/delete-chart-account";
import { updateChartAccountAction } from "@/lib/actions/money/update-chart-account";
import { bookLine } from "@/lib/actions/money/reconcile-lines";
import { FLYING_CLUB_CHART } from "@/lib/money";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { seedScenario } from "./bookings-helpers";

const SLUG = "reedwater";
const TREASURER = "treasurer@hangarline.test";
const key = () => crypto.randomUUID();
const accountByCode = (code: string) => listChart(db(), clubBySlug(SLUG).id).find((a) => a.code === code);

describe("chart of accounts", () => {
  beforeAll(async () => {
    await seedScenario();
  });

  it("every club's chart holds the flying-club categories", () => {
    for (const slug of ["reedwater", "cottonwood-flyers", "aeroclub-silberau"]) {
      const codes = listChart(db(), clubBySlug(slug).id).map((a) => a.code);
      for (const c of FLYING_CLUB_CHART) expect(codes, `${slug} ${c.code}`).toContain(c.code);
    }
    expect(accountByCode("aircraft-insurance")).toMatchObject({ name: "Aircraft insurance", type: "expense", inUse: false });
    expect(accountByCode("bank")).toMatchObject({ system: true, inUse: true });
  });

  it("the treasurer adds a sub-account; bad input is refused per field and nothing is written", async () => {
    signInAs(TREASURER);
    const before = db().select().from(ledgerAccounts).all().length;
    const bad = await createChartAccountAction(EMPTY, form({ club: SLUG, code: "Annual Inspection!", name: "A", type: "expense", parentCode: "dues-income", idempotencyKey: key() }));
    expect(bad.ok).toBe(false);
    expect(bad.fieldErrors.code?.[0]).toMatch(/lower-case letters/);
    expect(bad.fieldErrors.parentCode?.[0]).toMatch(/expense account can only sit under another expense/);
    const dup = await createChartAccountAction(EMPTY, form({ club: SLUG, code: "bank", name: "Second bank", type: "asset", idempotencyKey: key() }));
    expect(dup.fieldErrors.code?.[0]).toMatch(/already used by "Bank"/);
    expect(db().select().from(ledgerAccounts).all().length).toBe(before);

    const made = await createChartAccountAction(EMPTY, form({ club: SLUG, code: "annual-inspection", name: "Annual inspection", type: "expense", parentCode: "maintenance", idempotencyKey: key() }));
    expect(made, made.message).toMatchObject({ ok: true });
    expect(accountByCode("annual-inspection")).toMatchObject({ parentCode: "maintenance", type: "expense", inUse: false });
  });

  it("a member or the admin (who only reads the books) cannot change the chart", async () => {
    for (const who of ["member@hangarline.test", "admin@hangarline.test"]) {
      signInAs(who);
      const state = await createChartAccountAction(EMPTY, form({ club: SLUG, code: "sneaky", name: "Sneaky", type: "expense", idempotencyKey: key() }));
      expect(state.ok, who).toBe(false);
    }
    expect(accountByCode("sneaky")).toBeUndefined();
  });

  it("an account in use keeps its code and type and cannot be deleted; the application's accounts neither", async () => {
    signInAs(TREASURER);
    const flight = accountByCode("flight-income")!;
    const recode = await updateChartAccountAction(EMPTY, form({ club: SLUG, accountId: flight.id, code: "flying", name: "Flying", type: "expense", idempotencyKey: key() }));
    expect(recode.ok).toBe(false);
    expect(recode.fieldErrors.code?.[0]).toMatch(/used by the application/);
    expect(recode.fieldErrors.type?.[0]).toMatch(/used by the application/);
    const rename = await updateChartAccountAction(EMPTY, form({ club: SLUG, accountId: flight.id, code: "flight-income", name: "Aircraft rental income", type: "income", idempotencyKey: key() }));
    expect(rename, rename.message).toMatchObject({ ok: true });
    expect(accountByCode("flight-income")!.name).toBe("Aircraft rental income");
    const del = await deleteChartAccountAction(EMPTY, form({ club: SLUG, accountId: flight.id, idempotencyKey: key() }));
    expect(del.ok).toBe(false);
    expect(del.message).toMatch(/used by the application/);

    // A parent with a sub-account is not deleted; once the sub-account is gone it may be.
    const maint = accountByCode("maintenance")!;
    expect((await deleteChartAccountAction(EMPTY, form({ club: SLUG, accountId: maint.id, idempotencyKey: key() }))).message).toMatch(/move them first/);
    const sub = accountByCode("annual-inspection")!;
    expect(await deleteChartAccountAction(EMPTY, form({ club: SLUG, accountId: sub.id, idempotencyKey: key() }))).toMatchObject({ ok: true });
    expect(accountByCode("annual-inspection")).toBeUndefined();
  });

  it("an unknown bank line is booked to the account the treasurer chooses; without a choice nothing is written", async () => {
    signInAs(TREASURER);
    const club = clubBySlug(SLUG);
    const open = db().select().from(bankLines).where(and(eq(bankLines.clubId, club.id), eq(bankLines.ignored, false))).all()
      .find((l) => !db().$client.prepare("select 1 from reconciliation_matches where bank_line_id = ?").get(l.id));
    expect(open, "the demo statement has an open line").toBeDefined();
    const entries = db().select().from(journalEntries).all().length;
    const none = await bookLine(EMPTY, form({ club: SLUG, bankLineId: open!.id, account: "", idempotencyKey: key() }));
    expect(none.ok).toBe(false);
    expect(none.fieldErrors.account?.[0]).toMatch(/Choose the account/);
    const toBank = await bookLine(EMPTY, form({ club: SLUG, bankLineId: open!.id, account: "bank", idempotencyKey: key() }));
    expect(toBank.fieldErrors.account?.[0]).toMatch(/not the bank itself/);
    const unknown = await bookLine(EMPTY, form({ club: SLUG, bankLineId: open!.id, account: "no-such-account", idempotencyKey: key() }));
    expect(unknown.fieldErrors.account?.[0]).toMatch(/not in the club's chart/);
    expect(db().select().from(journalEntries).all().length).toBe(entries);

    const target = open!.amountMinor < 0 ? "hangar-tie-down" : "interest-income";
    const booked = await bookLine(EMPTY, form({ club: SLUG, bankLineId: open!.id, account: target, memo: "Booked to a category", idempotencyKey: key() }));
    expect(booked, booked.message).toMatchObject({ ok: true });
    const acct = accountByCode(target)!;
    const line = db().select().from(journalLines).where(eq(journalLines.accountId, acct.id)).all();
    expect(line).toHaveLength(1);
    expect(line[0]!.debitMinor + line[0]!.creditMinor).toBe(Math.abs(open!.amountMinor));
    expect(accountByCode(target)!.inUse).toBe(true);
  });
});
