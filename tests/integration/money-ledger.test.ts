// The ledger through its actions and handlers: dues plans, billing runs (idempotent), late fees,
// statements (web figures and PDF, e-mailed once), flight charges, reversals, reminders and who
// may see what. Amounts are our own arithmetic unless a source is named.
import { and, eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as journalApi } from "@/app/api/clubs/[club]/money/journal/route";
import { GET as statementPdf } from "@/app/api/clubs/[club]/statements/[userId]/[month]/route";
import { aircraft, duesPlans, emailOutbox, flights, journalEntries, journalLines, users } from "@/db/schema";
import { assignDuesPlan } from "@/lib/actions/money/assign-dues-plan";
import { postAdjustment } from "@/lib/actions/money/post-adjustment";
import { recordManualPayment } from "@/lib/actions/money/record-manual-payment";
import { reverseJournalEntry } from "@/lib/actions/money/reverse-entry";
import { runBilling } from "@/lib/actions/money/run-billing";
import { saveDuesPlan } from "@/lib/actions/money/save-dues-plan";
import { saveMoneySettings } from "@/lib/actions/money/save-rates";
import { sendReminders } from "@/lib/actions/money/send-dues-reminders";
import { memberArrears } from "@/db/queries/money-arrears";
import { memberBalance } from "@/db/queries/money-member-balances";
import { LedgerError } from "@/lib/money/errors";
import { postFlightCharge, reverseFlightCharge } from "@/db/queries/money-flight-charges";
import { statementFor } from "@/db/queries/money-statements";
import { EMPTY, clubBySlug, db, form, seedOnce, signInAs } from "./helpers";

const CLUB = "reedwater";
const TREASURER = "treasurer@hangarline.test";
const uid = (email: string) => db().select().from(users).where(eq(users.email, email)).get()!.id;
const club = () => clubBySlug(CLUB);
const entries = (kind: string) => Number(db().select({ n: sql<number>`count(*)` }).from(journalEntries).where(and(eq(journalEntries.clubId, club().id), sql`${journalEntries.kind} = ${kind}`)).get()!.n);
const statementMails = () => db().select().from(emailOutbox).where(eq(emailOutbox.template, "statement")).all().length;
const req = (url: string) => new Request(`http://app.test${url}`);

beforeAll(async () => {
  await seedOnce();
});

describe("dues plans and billing runs", () => {
  it("refuses a bad plan field by field and writes nothing", async () => {
    signInAs(TREASURER);
    const state = await saveDuesPlan(EMPTY, form({ club: CLUB, name: "", period: "weekly", category: "full", amount: "ninety" }));
    expect(state.ok).toBe(false);
    expect(Object.keys(state.fieldErrors).sort()).toEqual(["amount", "name", "period"]);
    expect(db().select().from(duesPlans).all()).toHaveLength(0);
  });

  it("bills a month once, prorating a member who joined in it; a second run posts nothing", async () => {
    signInAs(TREASURER);
    expect((await saveDuesPlan(EMPTY, form({ club: CLUB, name: "Full member, monthly", period: "monthly", category: "full", amount: "95.00", active: "on" }))).ok).toBe(true);
    const plan = db().select().from(duesPlans).where(eq(duesPlans.clubId, club().id)).get()!;
    for (const email of ["member@hangarline.test", "pilot2@hangarline.test"]) {
      expect((await assignDuesPlan(EMPTY, form({ club: CLUB, memberUserId: uid(email), planId: plan.id, startsOn: "2025-01-01" }))).ok).toBe(true);
    }
    // Joined 16 April: 15 of April's 30 days → 9,500 × 15 ÷ 30 = 4,750 (prorate by days, both ends counted)
    expect((await assignDuesPlan(EMPTY, form({ club: CLUB, memberUserId: uid("student@hangarline.test"), planId: plan.id, startsOn: "2025-04-16" }))).ok).toBe(true);

    const first = await runBilling(EMPTY, form({ club: CLUB, month: "2025-04" }));
    expect(first).toMatchObject({ ok: true, data: { duesPosted: 3, totalMinor: 9500 + 9500 + 4750 } });
    const again = await runBilling(EMPTY, form({ club: CLUB, month: "2025-04" }));
    expect(again).toMatchObject({ ok: true, data: { duesPosted: 0, lateFeesPosted: 0, totalMinor: 0, alreadyPosted: 3 } });
    expect(again.message).toMatch(/Nothing new/);
    expect(entries("dues")).toBe(3);
    expect(memberBalance(db(), club().id, uid("student@hangarline.test"))).toBe(4750);
  });

  it("issues last month's statements with the run, e-mailed once", async () => {
    signInAs(TREASURER);
    const before = statementMails();
    const may = await runBilling(EMPTY, form({ club: CLUB, month: "2025-05" }));
    expect(may).toMatchObject({ ok: true, data: { duesPosted: 3, statementsIssued: 3 } });
    expect(statementMails()).toBe(before + 3);
    await runBilling(EMPTY, form({ club: CLUB, month: "2025-05" }));
    expect(statementMails()).toBe(before + 3);
    const april = statementFor(db(), club().id, uid("member@hangarline.test"), "2025-04");
    expect(april).toMatchObject({ openingMinor: 0, chargesMinor: 9500, creditsMinor: 0, closingMinor: 9500 });
  });

  it("charges a late fee once to members more than the grace days past due", async () => {
    signInAs(TREASURER);
    expect((await saveMoneySettings(EMPTY, form({ club: CLUB, paymentTermsDays: "14", lateFeeFlat: "15.00", lateFeePercent: "0", fuelCreditCap: "6.60" }))).ok).toBe(true);
    // member@ pays everything; pilot2@ and student@ do not.
    const paid = await recordManualPayment(EMPTY, form({ club: CLUB, memberUserId: uid("member@hangarline.test"), method: "cheque", amount: "190.00", receivedOn: "2025-05-20", reference: "1042" }));
    expect(paid.ok).toBe(true);
    const june = await runBilling(EMPTY, form({ club: CLUB, month: "2025-06" }));
    expect(june).toMatchObject({ ok: true, data: { lateFeesPosted: 2 } });
    expect((await runBilling(EMPTY, form({ club: CLUB, month: "2025-06" }))).data).toMatchObject({ lateFeesPosted: 0 });
    expect(entries("late-fee")).toBe(2);
    const today = new Date().toISOString().slice(0, 10);
    expect(memberArrears(db(), club().id, uid("pilot2@hangarline.test"), today).inArrears).toBe(true);
    expect(memberArrears(db(), club().id, uid("member@hangarline.test"), today)).toMatchObject({ inArrears: true, balanceMinor: 9500 });
    expect(db().select().from(emailOutbox).where(and(eq(emailOutbox.toAddress, "member@hangarline.test"), eq(emailOutbox.template, "receipt"))).all()).toHaveLength(1);
  });

  it("refuses to bill a month after next", async () => {
    signInAs(TREASURER);
    const far = await runBilling(EMPTY, form({ club: CLUB, month: "2099-01" }));
    expect(far.ok).toBe(false);
    expect(far.fieldErrors.month?.[0]).toMatch(/next month at the latest/);
  });

  it("a plain member cannot run billing or post adjustments", async () => {
    signInAs("member@hangarline.test");
    expect((await runBilling(EMPTY, form({ club: CLUB, month: "2025-07" }))).message).toMatch(/treasurer/i);
    const adj = await postAdjustment(EMPTY, form({ club: CLUB, memberUserId: uid("member@hangarline.test"), direction: "credit", account: "dues-income", amount: "95", date: "2025-07-01", memo: "Free money" }));
    expect(adj.ok).toBe(false);
    expect(entries("adjustment")).toBe(0);
  });
});

describe("flight charges", () => {
  let flightId = "";
  beforeAll(() => {
    const [plane] = db().insert(aircraft).values({ clubId: club().id, registration: "N0777T", make: "Fernwhistle", model: "F160", typeGroup: "Fernwhistle F160", hourlyRateMinor: 15200 }).returning().all();
    const [flight] = db().insert(flights).values({ clubId: club().id, aircraftId: plane!.id, pilotId: uid("member@hangarline.test"), flownOn: "2025-06-12", hobbsOut: 1233.5, hobbsIn: 1234.7, tachOut: 1010.2, tachIn: 1011.2, fuelUnit: "gal", oilUnit: "qt" }).returning().all();
    flightId = flight!.id;
  });

  it("posts meter hours × the aircraft's rate less the fuel credit, once per flight", () => {
    const ctx = { club: club(), user: { id: uid(TREASURER) } };
    const before = memberBalance(db(), club().id, uid("member@hangarline.test"));
    const input = { clubId: club().id, memberUserId: uid("member@hangarline.test"), flightId, meterOut: 1233.5, meterIn: 1234.7, ratePerHourMinor: 15200, fuelCreditMinor: 4000, date: "2025-06-12", aircraftLabel: "N0777T" };
    const first = db().transaction((tx) => postFlightCharge(tx, ctx, input));
    // 1.2 h × $152.00 = $182.40 = 18,240; less a $40.00 fuel credit → 14,240 (own arithmetic)
    expect(first).toMatchObject({ posted: true, timeChargeMinor: 18240, fuelCreditMinor: 4000, netMinor: 14240 });
    expect(db().transaction((tx) => postFlightCharge(tx, ctx, input))).toMatchObject({ posted: false, entryId: first.entryId });
    expect(memberBalance(db(), club().id, uid("member@hangarline.test"))).toBe(before + 14240);
    // A corrected flight: reverse, then post the corrected meters (1.3 h × 15,200 = 19,760).
    db().transaction((tx) => reverseFlightCharge(tx, ctx, flightId));
    const fixed = db().transaction((tx) => postFlightCharge(tx, ctx, { ...input, meterIn: 1234.8, fuelCreditMinor: 0 }));
    expect(fixed).toMatchObject({ posted: true, netMinor: 19760 });
    expect(memberBalance(db(), club().id, uid("member@hangarline.test"))).toBe(before + 19760);
  });

  it("refuses a stranger's account, another club's flight and meters that run backwards", () => {
    const ctx = { club: club(), user: null };
    const base = { clubId: club().id, memberUserId: uid("cottonwood.pilot@hangarline.test"), flightId: "f-x", meterOut: 10, meterIn: 11, ratePerHourMinor: 100, date: "2025-06-12" };
    expect(() => db().transaction((tx) => postFlightCharge(tx, ctx, base))).toThrow(LedgerError);
    expect(() => db().transaction((tx) => postFlightCharge(tx, ctx, { ...base, clubId: clubBySlug("cottonwood-flyers").id }))).toThrow(/another club/);
    expect(() => db().transaction((tx) => postFlightCharge(tx, ctx, { ...base, memberUserId: uid("member@hangarline.test"), meterIn: 9 }))).toThrow(RangeError);
  });
});

describe("corrections, reminders and the books as a whole", () => {
  it("reverses an entry once with a reversing entry, and never edits a posted one", async () => {
    signInAs(TREASURER);
    expect((await postAdjustment(EMPTY, form({ club: CLUB, memberUserId: uid("pilot2@hangarline.test"), direction: "charge", account: "flight-income", amount: "50", date: "2025-06-20", memo: "Wrong aircraft" }))).ok).toBe(true);
    const wrong = db().select().from(journalEntries).where(and(eq(journalEntries.clubId, club().id), eq(journalEntries.memo, "Wrong aircraft"))).get()!;
    expect((await reverseJournalEntry(EMPTY, form({ club: CLUB, entryId: wrong.id }))).ok).toBe(true);
    const twice = await reverseJournalEntry(EMPTY, form({ club: CLUB, entryId: wrong.id }));
    expect(twice).toMatchObject({ ok: false, message: "This entry has already been reversed." });
    expect(() => db().update(journalLines).set({ debitMinor: 1 }).where(eq(journalLines.entryId, wrong.id)).run()).toThrow(/never edited/);
    expect(() => db().delete(journalEntries).where(eq(journalEntries.id, wrong.id)).run()).toThrow(/never deleted/);
  });

  it("sends dues reminders to members past due, at most once a day", async () => {
    signInAs(TREASURER);
    const first = await sendReminders(EMPTY, form({ club: CLUB }));
    expect(first.message).toMatch(/^3 reminders queued/);
    expect((await sendReminders(EMPTY, form({ club: CLUB }))).message).toMatch(/Nobody to remind/);
    expect(db().select().from(emailOutbox).where(eq(emailOutbox.template, "dues-reminder")).all()).toHaveLength(3);
  });

  it("every entry in the database balances and has at least two lines", () => {
    const bad = db()
      .select({ entryId: journalLines.entryId })
      .from(journalLines)
      .groupBy(journalLines.entryId)
      .having(sql`sum(${journalLines.debitMinor}) <> sum(${journalLines.creditMinor}) or count(*) < 2`)
      .all();
    expect(bad).toEqual([]);
    const lineless = db().select({ id: journalEntries.id }).from(journalEntries).where(sql`not exists (select 1 from journal_lines l where l.entry_id = ${journalEntries.id})`).all();
    expect(lineless).toEqual([]);
    expect(Number(db().select({ n: sql<number>`count(*)` }).from(journalEntries).get()!.n)).toBeGreaterThan(10);
  });
});

describe("who may see money", () => {
  const pdf = (viewerSlug: string, userEmail: string, month = "2025-05") => statementPdf(req(`/api/clubs/${viewerSlug}/statements/x/${month}`), { params: Promise.resolve({ club: viewerSlug, userId: uid(userEmail), month }) });

  it("a member reads their own statement PDF but not another member's", async () => {
    signInAs("member@hangarline.test");
    const own = await pdf(CLUB, "member@hangarline.test");
    expect(own.status).toBe(200);
    expect(own.headers.get("content-type")).toBe("application/pdf");
    expect(Buffer.from(await own.arrayBuffer()).subarray(0, 5).toString()).toBe("%PDF-");
    const other = await pdf(CLUB, "pilot2@hangarline.test");
    expect(other.status).toBe(404);
    expect(await other.json()).toMatchObject({ error: { code: "not_found" } });
  });

  it("the treasurer reads any member's statement; a bad month is a 400", async () => {
    signInAs(TREASURER);
    expect((await pdf(CLUB, "pilot2@hangarline.test")).status).toBe(200);
    expect((await pdf(CLUB, "pilot2@hangarline.test", "2025-13")).status).toBe(400);
  });

  it("another club's ledger is a 404, and roles without money get 403", async () => {
    const journal = (slug: string, query = "") => journalApi(req(`/api/clubs/${slug}/money/journal${query}`), { params: Promise.resolve({ club: slug }) });
    signInAs(TREASURER);
    const own = await journal(CLUB);
    expect(own.status).toBe(200);
    expect(((await own.json()) as { entries: unknown[] }).entries.length).toBeGreaterThan(5);
    expect((await journal("cottonwood-flyers")).status).toBe(404);
    const csv = await journal(CLUB, "?format=csv");
    expect(csv.headers.get("content-type")).toMatch(/text\/csv/);
    expect((await csv.text()).split("\r\n")[0]).toBe("Date,Entry,Kind,Memo,Reference,Account code,Account,Debit,Credit,Currency");
    signInAs("maintenance@hangarline.test");
    expect((await journal(CLUB)).status).toBe(403);
    signInAs("member@hangarline.test");
    expect((await journal(CLUB)).status).toBe(403);
    signInAs(null);
    expect((await journal(CLUB)).status).toBe(401);
  });
});
