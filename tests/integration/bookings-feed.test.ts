import ICAL from "ical.js";
import { and, eq, or } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET } from "@/app/api/calendar/[token]/route";
import { bookings, calendarFeedTokens, memberships } from "@/db/schema";
import { cancelBooking } from "@/lib/actions/bookings/cancel-booking";
import { createBooking } from "@/lib/actions/bookings/create-booking";
import { manageCalendarLink } from "@/lib/actions/bookings/calendar-link";
import { getLiveFeedToken, readFeedSecret } from "@/db/queries/bookings-feed";
import { auditLog } from "@/db/schema";
import { hashToken, sealSecret } from "@/lib/server/tokens";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { ALL_GUARDS, localAt, planeId, seedScenario, setGuards } from "./bookings-helpers";

const SLUG = "reedwater";

async function makeLink(email: string): Promise<string> {
  signInAs(email);
  const state = await manageCalendarLink(EMPTY, form({ club: SLUG, intent: "create" }));
  expect(state.ok).toBe(true);
  const url = (state.data as { url: string }).url;
  return url.split("/api/calendar/")[1]!;
}

async function fetchFeed(secret: string) {
  return GET(new Request(`http://app.test/api/calendar/${secret}`), { params: Promise.resolve({ token: secret }) });
}

/** UIDs of the VEVENTs, parsed by ical.js (an iCalendar parser independent of the generator). */
function eventUids(body: string): string[] {
  const calendar = new ICAL.Component(ICAL.parse(body));
  expect(calendar.name).toBe("vcalendar");
  return calendar.getAllSubcomponents("vevent").map((v) => String(v.getFirstPropertyValue("uid")));
}

describe("the member's calendar feed (iCalendar, RFC 5545)", () => {
  beforeAll(async () => {
    await seedScenario();
    // These tests are about the feed, not the guards: every guard only warns, and is accepted.
    setGuards(SLUG, { grounded: "warn", inspectionDue: "warn", notCheckedOut: "warn", notCurrent: "warn", flightReview: "warn", medicalExpired: "warn", inArrears: "warn" });
  });

  it("holds exactly the person's bookings, as member and as instructor, and none of anyone else's", async () => {
    const club = clubBySlug(SLUG);
    const instructor = signInAs("instructor@hangarline.test")!;
    // One booking as the member flying, one cancelled: the feed shows the first only.
    const own = await createBooking(EMPTY, form({ club: SLUG, aircraftId: planeId(SLUG, "N0534L"), startsAt: localAt(club, 5, "16:00"), endsAt: localAt(club, 5, "17:00"), acceptedGuards: ALL_GUARDS }));
    expect(own, own.message).toMatchObject({ ok: true });
    const gone = await createBooking(EMPTY, form({ club: SLUG, aircraftId: planeId(SLUG, "N0534L"), startsAt: localAt(club, 6, "16:00"), endsAt: localAt(club, 6, "17:00"), acceptedGuards: ALL_GUARDS }));
    await cancelBooking(EMPTY, form({ club: SLUG, bookingId: (gone.data as { bookingId: string }).bookingId }));

    const secret = await makeLink("instructor@hangarline.test");
    const res = await fetchFeed(secret);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^text\/calendar/);
    const body = await res.text();
    const expected = db()
      .select({ id: bookings.id })
      .from(bookings)
      .where(and(eq(bookings.clubId, club.id), or(eq(bookings.userId, instructor.id), eq(bookings.instructorId, instructor.id))))
      .all()
      .filter((b) => b.id !== (gone.data as { bookingId: string }).bookingId)
      .map((b) => `${b.id}@app.test`)
      .sort();
    expect(expected.length).toBeGreaterThanOrEqual(2); // the seeded dual flight and the new one
    expect(eventUids(body).sort()).toEqual(expected);

    const event = new ICAL.Event(new ICAL.Component(ICAL.parse(body)).getAllSubcomponents("vevent").find((v) => v.getFirstPropertyValue("uid") === `${(own.data as { bookingId: string }).bookingId}@app.test`)!);
    const row = db().select().from(bookings).where(eq(bookings.id, (own.data as { bookingId: string }).bookingId)).get()!;
    expect(event.startDate.toJSDate().getTime()).toBe(row.startsAt.getTime());
    expect(event.endDate.toJSDate().getTime()).toBe(row.endsAt.getTime());
    expect(event.summary).toMatch(/^N0534L /);
  });

  it("another member's feed does not show the instructor's bookings", async () => {
    const secret = await makeLink("pilot2@hangarline.test");
    const pilot = signInAs("pilot2@hangarline.test")!;
    const uids = eventUids(await (await fetchFeed(secret)).text());
    const theirs = db().select({ id: bookings.id }).from(bookings).where(or(eq(bookings.userId, pilot.id), eq(bookings.instructorId, pilot.id))).all().map((b) => `${b.id}@app.test`);
    expect(uids.sort()).toEqual(theirs.sort());
  });

  it("a wrong secret is a 404, and so is one that was revoked or replaced", async () => {
    expect((await fetchFeed("not-a-real-secret-at-all-0000000000")).status).toBe(404);
    expect((await fetchFeed("x")).status).toBe(404);
    const first = await makeLink("member@hangarline.test");
    expect((await fetchFeed(first)).status).toBe(200);
    signInAs("member@hangarline.test");
    const replaced = await manageCalendarLink(EMPTY, form({ club: SLUG, intent: "rotate", confirm: "yes" }));
    expect(replaced.ok, replaced.message).toBe(true);
    const second = (replaced.data as { url: string }).url.split("/api/calendar/")[1]!;
    expect(second).not.toBe(first);
    expect((await fetchFeed(first)).status).toBe(404);
    expect((await fetchFeed(second)).status).toBe(200);
    const off = await manageCalendarLink(EMPTY, form({ club: SLUG, intent: "revoke", confirm: "yes" }));
    expect(off.ok).toBe(true);
    expect((await fetchFeed(second)).status).toBe(404);
    // The secret itself is never stored in the clear: its hash, and a seal only the app's key opens.
    const row = db().select().from(calendarFeedTokens).where(eq(calendarFeedTokens.tokenHash, hashToken(second))).get()!;
    expect(JSON.stringify(row)).not.toContain(second);
    expect(row.revokedAt).not.toBeNull();
  });

  it("a member who has left the club gets a 404 from an old link", async () => {
    const secret = await makeLink("twoclubs@hangarline.test");
    expect((await fetchFeed(secret)).status).toBe(200);
    const user = signInAs("twoclubs@hangarline.test")!;
    const club = clubBySlug(SLUG);
    db().update(memberships).set({ status: "inactive" }).where(and(eq(memberships.clubId, club.id), eq(memberships.userId, user.id))).run();
    expect((await fetchFeed(secret)).status).toBe(404);
  });
});

describe("the calendar link is shown again; replacing it is a separate, confirmed choice", () => {
  beforeAll(async () => {
    await seedScenario();
  });

  it("asking for the link again answers the same link, which keeps working (no second subscription broken)", async () => {
    const first = await makeLink("student@hangarline.test");
    const again = await makeLink("student@hangarline.test");
    expect(again).toBe(first);
    expect((await fetchFeed(first)).status).toBe(200);
    // The page reads the same secret back from the stored seal.
    const user = signInAs("student@hangarline.test")!;
    const live = getLiveFeedToken(db(), clubBySlug(SLUG).id, user.id)!;
    expect(readFeedSecret(live)).toBe(first);
    expect(live.secretSealed).not.toContain(first);
    const tokens = db().select().from(calendarFeedTokens).where(eq(calendarFeedTokens.userId, user.id)).all();
    expect(tokens).toHaveLength(1);
  });

  it("replacing or turning off without the confirmation is refused, and nothing changes", async () => {
    const secret = await makeLink("student@hangarline.test");
    const user = signInAs("student@hangarline.test")!;
    const auditBefore = db().select().from(auditLog).where(eq(auditLog.actorId, user.id)).all().length;
    for (const intent of ["rotate", "revoke"]) {
      const refused = await manageCalendarLink(EMPTY, form({ club: SLUG, intent }));
      expect(refused.ok).toBe(false);
      expect(refused.fieldErrors.confirm?.[0]).toMatch(/Tick the box/);
    }
    expect((await fetchFeed(secret)).status).toBe(200);
    expect(db().select().from(auditLog).where(eq(auditLog.actorId, user.id)).all().length).toBe(auditBefore);
    expect(readFeedSecret(getLiveFeedToken(db(), clubBySlug(SLUG).id, user.id)!)).toBe(secret);
  });

  it("a replaced link is recorded as a replacement, and the new one is shown from then on", async () => {
    const old = await makeLink("student@hangarline.test");
    const user = signInAs("student@hangarline.test")!;
    const answer = await manageCalendarLink(EMPTY, form({ club: SLUG, intent: "rotate", confirm: "yes" }));
    expect(answer.ok).toBe(true);
    expect(answer.message).toMatch(/old one no longer works/);
    const fresh = (answer.data as { url: string }).url.split("/api/calendar/")[1]!;
    expect((await fetchFeed(old)).status).toBe(404);
    expect(readFeedSecret(getLiveFeedToken(db(), clubBySlug(SLUG).id, user.id)!)).toBe(fresh);
    const last = db().select().from(auditLog).where(eq(auditLog.actorId, user.id)).all().at(-1)!;
    expect(last.action).toBe("calendar.link.rotate");
  });

  it("a link made before links were kept sealed still works, and is not shown (nothing to show)", async () => {
    const user = signInAs("pilot2@hangarline.test")!;
    const club = clubBySlug(SLUG);
    const secret = "legacy-secret-made-before-seals-000000000000";
    db().update(calendarFeedTokens).set({ revokedAt: new Date() }).where(eq(calendarFeedTokens.userId, user.id)).run();
    db().insert(calendarFeedTokens).values({ clubId: club.id, userId: user.id, tokenHash: hashToken(secret) }).run();
    expect((await fetchFeed(secret)).status).toBe(200);
    expect(readFeedSecret(getLiveFeedToken(db(), club.id, user.id)!)).toBeNull();
    const asked = await manageCalendarLink(EMPTY, form({ club: SLUG, intent: "create" }));
    expect(asked.ok).toBe(true);
    expect((asked.data as { url: string | null }).url).toBeNull();
    expect((await fetchFeed(secret)).status).toBe(200);
  });

  it("a seal of another secret (or from another key) is never shown", () => {
    const user = signInAs("student@hangarline.test")!;
    const live = getLiveFeedToken(db(), clubBySlug(SLUG).id, user.id)!;
    expect(readFeedSecret({ tokenHash: live.tokenHash, secretSealed: sealSecret("some-other-secret-value-000000000", "calendar-feed") })).toBeNull();
    expect(readFeedSecret({ tokenHash: live.tokenHash, secretSealed: `${live.secretSealed}x` })).toBeNull();
  });
});
