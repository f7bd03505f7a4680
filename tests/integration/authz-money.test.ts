// Authorization where the money data is read: each page, handler and action checks its own
// permission (the money layout is only a courtesy, and an RSC request can render a page
// without it). A plain member gets the not-found page and none of the data; they read their own
// account; another member's account or statement is answered exactly like a missing one.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as journalApi } from "@/app/api/clubs/[club]/money/journal/route";
import { GET as reconciliationApi } from "@/app/api/clubs/[club]/money/reconciliation/[statementId]/route";
import { GET as statementPdf } from "@/app/api/clubs/[club]/statements/[userId]/[month]/route";
import MyAccountPage from "@/app/clubs/[club]/account/page";
import MyStatementPage from "@/app/clubs/[club]/account/statements/[month]/page";
import AgeingPage from "@/app/clubs/[club]/money/ageing/page";
import BalancesPage from "@/app/clubs/[club]/money/balances/page";
import BillingPage from "@/app/clubs/[club]/money/billing/page";
import JournalPage from "@/app/clubs/[club]/money/journal/page";
import MoneyLayout from "@/app/clubs/[club]/money/layout";
import MemberAccountPage from "@/app/clubs/[club]/money/members/[userId]/page";
import MemberStatementPage from "@/app/clubs/[club]/money/members/[userId]/statements/[month]/page";
import MoneyOverview from "@/app/clubs/[club]/money/page";
import PaymentsPage from "@/app/clubs/[club]/money/payments/page";
import RatesPage from "@/app/clubs/[club]/money/rates/page";
import ReconciliationPage from "@/app/clubs/[club]/money/reconciliation/page";
import StatementWorkspacePage from "@/app/clubs/[club]/money/reconciliation/[statementId]/page";
import ChartPage from "@/app/clubs/[club]/money/accounts/page";
import BillsPage from "@/app/clubs/[club]/money/bills/page";
import MeterGapsPage from "@/app/clubs/[club]/money/meter-gaps/page";
import BalanceSheetPage from "@/app/clubs/[club]/money/reports/balance-sheet/page";
import ProfitAndLossPage from "@/app/clubs/[club]/money/reports/profit-and-loss/page";
import { bankStatements, emailOutbox, users } from "@/db/schema";
import { emailStatement } from "@/lib/actions/money/email-statement";
import { postAdjustment } from "@/lib/actions/money/post-adjustment";
import { recordManualPayment } from "@/lib/actions/money/record-manual-payment";
import { clubToday } from "@/lib/money/settings";
import { withClub } from "@/lib/server/api";
import { authorizePage } from "@/lib/server/authorize";
import { ConditionalSubjectError } from "@/permissions";
import { params, treeText } from "./authz-helpers";
import { seedScenario } from "./bookings-helpers";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";

const CLUB = "reedwater";
const MEMBER = "member@hangarline.test"; // Rowan Pike, plain member
const uid = (email: string) => db().select().from(users).where(eq(users.email, email)).get()!.id;
const nameOf = (email: string) => db().select().from(users).where(eq(users.email, email)).get()!.name!;
const month = () => clubToday(clubBySlug(CLUB)).slice(0, 7);
const slug = { club: CLUB };
let statementId = "";

// Every page a plain member must not open, with the params it takes.
const moneyPages = (): [string, () => Promise<unknown>][] => [
  ["money overview", () => MoneyOverview(params(slug))],
  ["journal", () => JournalPage(params(slug))],
  ["balances", () => BalancesPage(params(slug))],
  ["billing", () => BillingPage(params(slug))],
  ["ageing", () => AgeingPage(params(slug))],
  ["payments", () => PaymentsPage(params(slug))],
  ["rates", () => RatesPage(params(slug))],
  ["reconciliation", () => ReconciliationPage(params(slug))],
  ["reconciliation statement", () => StatementWorkspacePage(params({ club: CLUB, statementId }))],
  ["chart of accounts", () => ChartPage(params(slug))],
  ["bills", () => BillsPage(params(slug))],
  ["meter gaps", () => MeterGapsPage(params(slug))],
  ["profit and loss", () => ProfitAndLossPage({ ...params(slug), searchParams: Promise.resolve({ from: "2026-01-01", to: "2026-12-31" }) })],
  ["balance sheet", () => BalanceSheetPage({ ...params(slug), searchParams: Promise.resolve({ asOf: "2026-12-31" }) })],
  ["another member's account", () => MemberAccountPage(params({ club: CLUB, userId: uid("pilot2@hangarline.test") }))],
  ["another member's statement", () => MemberStatementPage(params({ club: CLUB, userId: uid("pilot2@hangarline.test"), month: month() }))],
];

beforeAll(async () => {
  await seedScenario();
  statementId = db().select().from(bankStatements).where(eq(bankStatements.clubId, clubBySlug(CLUB).id)).get()?.id ?? "no-statement";
});

describe("money pages check their own permission", () => {
  it("a plain member gets the not-found page from every money page, without its layout", async () => {
    signInAs(MEMBER);
    for (const [name, render] of moneyPages()) await expect(render(), name).rejects.toThrow("not found");
    // The layout says the same, as a courtesy.
    await expect(MoneyLayout({ children: null, params: Promise.resolve(slug) })).rejects.toThrow("not found");
  });

  it("maintenance and a mechanic get the not-found page too", async () => {
    for (const who of ["maintenance@hangarline.test", "mechanic@hangarline.test"]) {
      signInAs(who);
      for (const [name, render] of moneyPages()) await expect(render(), `${who} ${name}`).rejects.toThrow("not found");
    }
  });

  it("the treasurer's pages carry every member's balance (the same check lets the right role in)", async () => {
    signInAs("treasurer@hangarline.test");
    const balances = treeText(await BalancesPage(params(slug)));
    expect(balances).toContain(nameOf("pilot2@hangarline.test"));
    expect(balances).toContain(nameOf(MEMBER));
    for (const [name, render] of moneyPages()) {
      if (name === "reconciliation statement" && statementId === "no-statement") continue;
      await expect(render(), name).resolves.toBeTruthy();
    }
  });

  it("a club admin reads the ledger but is given no member list for a posting form it cannot use", async () => {
    signInAs("admin@hangarline.test");
    const text = treeText(await JournalPage(params(slug)));
    expect(text).not.toContain("Charge or credit a member");
    signInAs("treasurer@hangarline.test");
    expect(treeText(await JournalPage(params(slug)))).toContain("Charge or credit a member");
  });
});

describe("a member's own account", () => {
  it("reads their own account and statement, never another member's", async () => {
    signInAs(MEMBER);
    const mine = treeText(await MyAccountPage(params(slug)));
    expect(mine).not.toContain(nameOf("pilot2@hangarline.test"));
    await expect(MyStatementPage(params({ club: CLUB, month: month() }))).resolves.toBeTruthy();
    await expect(MemberAccountPage(params({ club: CLUB, userId: uid(MEMBER) }))).resolves.toBeTruthy();
    await expect(MemberStatementPage(params({ club: CLUB, userId: uid(MEMBER), month: month() }))).resolves.toBeTruthy();
  });

  it("another member's statement PDF is a 404 exactly like a missing member's", async () => {
    signInAs(MEMBER);
    const pdf = async (userId: string) => statementPdf(new Request(`http://app.test/api/clubs/${CLUB}/statements/${userId}/${month()}`), params({ club: CLUB, userId, month: month() }));
    const own = await pdf(uid(MEMBER));
    expect(own.status).toBe(200);
    expect(own.headers.get("content-type")).toBe("application/pdf");
    const other = await pdf(uid("pilot2@hangarline.test"));
    const missing = await pdf("no-such-user");
    expect(other.status).toBe(404);
    expect(missing.status).toBe(404);
    expect(await other.text()).toBe(await missing.text());
  });

  it("actions: a member cannot e-mail another member's statement, post a charge or record a payment", async () => {
    signInAs(MEMBER);
    const before = db().select().from(emailOutbox).all().length;
    const mailed = await emailStatement(EMPTY, form({ club: CLUB, memberUserId: uid("pilot2@hangarline.test"), month: month() }));
    expect(mailed.ok).toBe(false);
    const charged = await postAdjustment(EMPTY, form({ club: CLUB, memberUserId: uid("pilot2@hangarline.test"), direction: "credit", account: "flight-income", amount: "10.00", date: clubToday(clubBySlug(CLUB)), memo: "test" }));
    expect(charged.ok).toBe(false);
    const paid = await recordManualPayment(EMPTY, form({ club: CLUB, memberUserId: uid(MEMBER), method: "cash", amount: "10.00", receivedOn: clubToday(clubBySlug(CLUB)) }));
    expect(paid.ok).toBe(false);
    expect(db().select().from(emailOutbox).all().length).toBe(before);
  });
});

describe("money handlers", () => {
  it("the journal and a bank statement answer a member without any entries", async () => {
    signInAs(MEMBER);
    const journal = await journalApi(new Request(`http://app.test/api/clubs/${CLUB}/money/journal`), params(slug));
    expect(journal.status).toBe(403);
    const body = (await journal.json()) as Record<string, unknown>;
    expect(body.entries).toBeUndefined();
    expect(JSON.stringify(body)).not.toContain(nameOf("pilot2@hangarline.test"));
    const statement = await reconciliationApi(new Request(`http://app.test/api/clubs/${CLUB}/money/reconciliation/${statementId}`), params({ club: CLUB, statementId }));
    expect([403, 404]).toContain(statement.status);
    expect(JSON.stringify(await statement.json())).not.toMatch(/"lines"/);
  });
});

describe("the helper refuses a type-level question on a conditional subject", () => {
  it("in a page and in a route handler, whoever asks", async () => {
    for (const who of [MEMBER, "treasurer@hangarline.test"]) {
      signInAs(who);
      await expect(authorizePage(CLUB, ["read", "Account"])).rejects.toThrow(ConditionalSubjectError);
      await expect(withClub(CLUB, ["read", "Account"], () => new Response("leaked"))).rejects.toThrow(ConditionalSubjectError);
    }
    signInAs("treasurer@hangarline.test");
    await expect(authorizePage(CLUB, ["read", "Account", "all"])).resolves.toBeTruthy();
    signInAs(MEMBER);
    await expect(authorizePage(CLUB, ["read", "Account", "all"])).rejects.toThrow("not found");
    await expect(authorizePage(CLUB, ["read", "Account", { userId: uid(MEMBER) }])).resolves.toBeTruthy();
    const refused = await withClub(CLUB, ["read", "Account", { userId: uid("pilot2@hangarline.test") }], () => new Response("leaked"));
    expect(refused.status).toBe(404);
  });
});
