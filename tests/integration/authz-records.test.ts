// Records with conditions in the permission table (a member's currency, medical, documents,
// safety reports) are checked on the record in every handler: one's own is readable, another
// member's is answered exactly like a missing one; roles that read them for everyone still do.
import { and, eq, isNotNull } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as currencyOf } from "@/app/api/clubs/[club]/currency/[userId]/route";
import { GET as documentsOf } from "@/app/api/clubs/[club]/documents/route";
import { GET as medicalOf } from "@/app/api/clubs/[club]/documents/medical/[userId]/route";
import { GET as reportApi } from "@/app/api/clubs/[club]/safety/reports/[reportId]/route";
import ClubsIndex from "@/app/clubs/page";
import MePage from "@/app/clubs/[club]/me/page";
import NewClubPage from "@/app/operator/clubs/new/page";
import OperatorHome from "@/app/operator/page";
import ReportPage from "@/app/clubs/[club]/safety/reports/[reportId]/page";
import { safetyReports, users } from "@/db/schema";
import { DEMO_CLUBS, DEMO_PEOPLE } from "@/db/seed/scenario";
import { params, treeText } from "./authz-helpers";
import { seedScenario } from "./bookings-helpers";
import { clubBySlug, db, expectRedirect, signInAs } from "./helpers";

const CLUB = "reedwater";
const MEMBER = "member@hangarline.test";
const OTHER = "pilot2@hangarline.test";
const uid = (email: string) => db().select().from(users).where(eq(users.email, email)).get()!.id;
const get = (url: string) => new Request(`http://app.test${url}`);
let namedReport = "";

beforeAll(async () => {
  await seedScenario();
  namedReport = db().select().from(safetyReports).where(and(eq(safetyReports.clubId, clubBySlug(CLUB).id), isNotNull(safetyReports.reporterId))).get()!.id;
});

describe("a member's own records, and nobody else's", () => {
  it("currency: own 200, another member's 404 like a missing one", async () => {
    signInAs(MEMBER);
    const call = (userId: string) => currencyOf(get(`/api/clubs/${CLUB}/currency/${userId}`), params({ club: CLUB, userId }));
    expect((await call(uid(MEMBER))).status).toBe(200);
    const other = await call(uid(OTHER));
    const missing = await call("no-such-user");
    expect(other.status).toBe(404);
    expect(await other.text()).toBe(await missing.text());
    signInAs("instructor@hangarline.test"); // instructors read every member's currency
    expect((await call(uid(OTHER))).status).toBe(200);
  });

  it("medical: own in full, another member's 404; the safety officer sees the expiry date only", async () => {
    signInAs(MEMBER);
    const call = (userId: string) => medicalOf(get(`/api/clubs/${CLUB}/documents/medical/${userId}`), params({ club: CLUB, userId }));
    const own = (await (await call(uid(MEMBER))).json()) as { medical: { level: string } };
    expect(own.medical.level).toBe("full");
    const other = await call(uid(OTHER));
    expect(other.status).toBe(404);
    expect(await other.text()).toBe(await (await call("no-such-user")).text());
    signInAs("safety@hangarline.test");
    const seen = (await (await call(uid(OTHER))).json()) as { medical: Record<string, unknown> };
    expect(seen.medical.level).toBe("expiry");
    expect(Object.keys(seen.medical).sort()).toEqual(["expiresOn", "level"]);
  });

  it("documents: own list, another member's 404", async () => {
    signInAs(MEMBER);
    const call = (userId?: string) => documentsOf(get(`/api/clubs/${CLUB}/documents${userId ? `?userId=${userId}` : ""}`), params({ club: CLUB }));
    const own = (await (await call()).json()) as { documents: unknown[] };
    expect(own.documents.length).toBeGreaterThan(0);
    expect((await call(uid(OTHER))).status).toBe(404);
  });

  it("the member's own page carries no one else's currency", async () => {
    signInAs(MEMBER);
    const text = treeText(await MePage(params({ club: CLUB })));
    expect(text).not.toContain(db().select().from(users).where(eq(users.email, OTHER)).get()!.name!);
  });

  it("safety report: the filer and the safety officer read it; another member gets 404 like a missing one", async () => {
    const call = (reportId: string) => reportApi(get(`/api/clubs/${CLUB}/safety/reports/${reportId}`), params({ club: CLUB, reportId }));
    signInAs(MEMBER);
    expect((await call(namedReport)).status).toBe(200);
    signInAs("safety@hangarline.test");
    expect((await call(namedReport)).status).toBe(200);
    signInAs(OTHER);
    const other = await call(namedReport);
    expect(other.status).toBe(404);
    expect(await other.text()).toBe(await (await call("no-such-report")).text());
    await expect(ReportPage({ params: Promise.resolve({ club: CLUB, reportId: namedReport }) })).rejects.toThrow("not found");
  });
});

describe("operator console pages check the operator themselves", () => {
  it("a club admin or member gets the 404 page, nobody signed in is sent to sign in", async () => {
    for (const who of [MEMBER, "admin@hangarline.test"]) {
      signInAs(who);
      await expect(OperatorHome(), who).rejects.toThrow("not found");
      await expect(NewClubPage(), who).rejects.toThrow("not found");
    }
    signInAs(null);
    expect(await expectRedirect(() => OperatorHome())).toBe("/sign-in?callbackUrl=/operator");
    signInAs("operator@hangarline.test");
    await expect(OperatorHome()).resolves.toBeTruthy();
  });
});

describe("the list of clubs is the signed-in person's own (the session guard in the page)", () => {
  it("nobody signed in is sent to sign in; a person sees their own clubs and no other", async () => {
    signInAs(null);
    expect(await expectRedirect(() => ClubsIndex())).toBe(`/sign-in?callbackUrl=${encodeURIComponent("/clubs")}`);
    // A person in one club goes straight to it.
    signInAs(MEMBER);
    expect(await expectRedirect(() => ClubsIndex())).toBe(`/clubs/${CLUB}`);
    // A person in two clubs chooses between those two; the third club is not named.
    const person = DEMO_PEOPLE.find((p) => Object.keys(p.clubs).length === 2)!;
    signInAs(person.email);
    const text = treeText(await ClubsIndex());
    for (const club of DEMO_CLUBS) {
      if (club.key in person.clubs) expect(text, club.key).toContain(club.name);
      else expect(text, club.key).not.toContain(club.name);
    }
    expect(DEMO_CLUBS.some((c) => !(c.key in person.clubs))).toBe(true);
  });
});
