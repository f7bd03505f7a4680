import { beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { GET as memberCurrencyRoute } from "@/app/api/clubs/[club]/currency/[userId]/route";
import { GET as boardRoute } from "@/app/api/clubs/[club]/currency/route";
import { auditLog, checkouts, flights, users } from "@/db/schema";
import { recordCheckout } from "@/lib/actions/checkouts/record-checkout";
import { revokeCheckout } from "@/lib/actions/checkouts/revoke-checkout";
import { recordOutsideFlight } from "@/lib/actions/documents/record-outside-flight";
import { addDays, isoDateInTimeZone } from "@/lib/dates";
import type { CurrencyItem } from "@/lib/safety/currency-summary";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { callRoute, planeByRegistration, seedFleetOnce } from "./fleet-helpers";

const CLUB = "reedwater";
const userId = (email: string) => db().select().from(users).where(eq(users.email, email)).get()!.id;
const today = () => isoDateInTimeZone(new Date(), "America/Chicago");
const checkoutForm = (email: string, extra: Record<string, string> = {}) =>
  form({ club: CLUB, userId: userId(email), typeGroup: "Brightwing BW-4", checkedOutOn: addDays(today(), -1), instructorCertificateNumber: "CFI 0007719", conditions: "Day VFR only", ...extra });

type Board = { members: { userId: string; items: CurrencyItem[] }[] };

describe("checkouts and currency", () => {
  beforeAll(async () => {
    await seedFleetOnce();
  });

  it("an instructor records a checkout with its conditions; members cannot, and nobody checks themselves out", async () => {
    signInAs("member@hangarline.test");
    expect((await recordCheckout(EMPTY, checkoutForm("student@hangarline.test"))).message).toMatch(/Only a instructor|instructor/);
    signInAs("instructor@hangarline.test");
    expect((await recordCheckout(EMPTY, checkoutForm("instructor@hangarline.test"))).fieldErrors.userId?.[0]).toMatch(/Another instructor/);
    expect((await recordCheckout(EMPTY, checkoutForm("mechanic@hangarline.test"))).fieldErrors.userId?.[0]).toMatch(/active member/);
    expect((await recordCheckout(EMPTY, checkoutForm("cottonwood.pilot@hangarline.test"))).fieldErrors.userId?.[0]).toMatch(/active member/);
    expect((await recordCheckout(EMPTY, checkoutForm("student@hangarline.test", { typeGroup: "Zeppelin" }))).fieldErrors.typeGroup?.[0]).toMatch(/Choose one of/);
    expect((await recordCheckout(EMPTY, checkoutForm("student@hangarline.test", { checkedOutOn: "2199-01-01" }))).fieldErrors.checkedOutOn).toEqual(["The date cannot be in the future."]);
    const ok = await recordCheckout(EMPTY, checkoutForm("student@hangarline.test", { typeGroup: "brightwing bw-4" }));
    expect(ok.ok).toBe(true);
    const row = db().select().from(checkouts).where(eq(checkouts.userId, userId("student@hangarline.test"))).get()!;
    expect(row).toMatchObject({ typeGroup: "Brightwing BW-4", instructorId: userId("instructor@hangarline.test"), instructorCertificateNumber: "CFI 0007719", conditions: "Day VFR only", revokedAt: null });
    const twice = await recordCheckout(EMPTY, checkoutForm("student@hangarline.test"));
    expect(twice.message).toMatch(/already checked out in Brightwing BW-4/);
  });

  it("revoking needs a reason and keeps the checkout as history", async () => {
    const row = db().select().from(checkouts).where(eq(checkouts.userId, userId("student@hangarline.test"))).get()!;
    signInAs("instructor@hangarline.test");
    expect((await revokeCheckout(EMPTY, form({ club: CLUB, checkoutId: row.id, reason: "" }))).fieldErrors.reason).toBeDefined();
    expect((await revokeCheckout(EMPTY, form({ club: CLUB, checkoutId: row.id, reason: "Hard landing; needs a check flight" }))).ok).toBe(true);
    expect(db().select().from(checkouts).where(eq(checkouts.id, row.id)).get()).toMatchObject({ revokeReason: "Hard landing; needs a check flight", revokedById: userId("instructor@hangarline.test") });
    expect((await revokeCheckout(EMPTY, form({ club: CLUB, checkoutId: row.id, reason: "Again and again" }))).message).toMatch(/already revoked/);
    expect(db().select().from(auditLog).where(and(eq(auditLog.subjectId, row.id), eq(auditLog.action, "checkout.revoke"))).all()).toHaveLength(1);
    // A new checkout after the revocation is allowed: the old one stays.
    expect((await recordCheckout(EMPTY, checkoutForm("student@hangarline.test"))).ok).toBe(true);
    expect(db().select().from(checkouts).where(eq(checkouts.userId, userId("student@hangarline.test"))).all()).toHaveLength(2);
  });

  it("currency comes from the flight log and the member's outside flights, the same on the board and the member's own view", async () => {
    const student = userId("student@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0534L"); // Brightwing BW-4
    const club = clubBySlug(CLUB);
    // Today's entries are newer than anything the demo flight log holds, so they decide.
    const flownOn = today();
    db().insert(flights).values({ clubId: club.id, aircraftId: plane.id, pilotId: student, flownOn, hobbsOut: 1, hobbsIn: 2, tachOut: 1, tachIn: 1.8, dayLandings: 3, dayFullStopLandings: 3, nightFullStopLandings: 0, fuelUnit: "gal", oilUnit: "qt" }).run();
    signInAs("student@hangarline.test");
    const night = await recordOutsideFlight(EMPTY, form({ club: CLUB, flownOn: today(), aircraftDescription: "Rental at Pinecrest Strip (PINESTRIP)", category: "Airplane", classRating: "Single-engine land", dayLandings: "0", nightFullStopLandings: "3" }));
    expect(night.ok, night.message).toBe(true);
    const own = await callRoute(memberCurrencyRoute, "/x", { club: CLUB, userId: student });
    expect(own.status).toBe(200);
    const items = (own.body as { items: CurrencyItem[] }).items;
    const by = (key: string) => items.find((i) => i.key === key)!;
    // 14 CFR 61.57(a),(b), day of the landings = day 1: landings on D count through D + 89.
    // The outside night flight is the student's own claim: shown beside, not counted.
    expect(by("passenger_night:airplane/singleengineland")).toMatchObject({ claim: { state: "current", lastDay: addDays(today(), 89) } });
    expect(by("passenger_night:airplane/singleengineland").lastDay).not.toBe(addDays(today(), 89));
    // N0534L is a tailwheel airplane of the class: its full stops count for both (61.57(a)(1)).
    expect(by("passenger_day:airplane/singleengineland")).toMatchObject({ state: "current", lastDay: addDays(today(), 89) });
    expect(by("passenger_day:airplane/singleengineland/tailwheel")).toMatchObject({ state: "current", lastDay: addDays(today(), 89) });
    // Club setting for Reedwater: flown the type group within 60 days (seeded recencyDaysInType).
    expect(by("recency:brightwing bw-4")).toMatchObject({ state: "current", lastDay: addDays(flownOn, 59) });
    expect(by("medical")).toMatchObject({ state: "missing", lastDay: null });

    signInAs("safety@hangarline.test");
    const board = await callRoute(boardRoute, "/x", { club: CLUB });
    expect(board.status).toBe(200);
    const row = (board.body as Board).members.find((m) => m.userId === student)!;
    expect(row.items).toEqual(items);
    expect((board.body as Board).members.map((m) => m.userId)).not.toContain(userId("mechanic@hangarline.test"));
  });

  it("the board is for instructors, the safety officer and admins; a member reads only their own currency", async () => {
    signInAs("member@hangarline.test");
    expect((await callRoute(boardRoute, "/x", { club: CLUB })).status).toBe(403);
    expect((await callRoute(memberCurrencyRoute, "/x", { club: CLUB, userId: userId("student@hangarline.test") })).status).toBe(404);
    expect((await callRoute(memberCurrencyRoute, "/x", { club: CLUB, userId: userId("member@hangarline.test") })).status).toBe(200);
    for (const email of ["instructor@hangarline.test", "admin@hangarline.test"]) {
      signInAs(email);
      expect((await callRoute(boardRoute, "/x", { club: CLUB })).status).toBe(200);
    }
    signInAs("cottonwood.admin@hangarline.test");
    expect((await callRoute(memberCurrencyRoute, "/x", { club: "cottonwood-flyers", userId: userId("student@hangarline.test") })).status).toBe(404);
  });
});
