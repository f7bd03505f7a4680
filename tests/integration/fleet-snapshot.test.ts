import { and, eq, isNull } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as flightLineRoute } from "@/app/api/clubs/[club]/flight-line/route";
import { clubDataVersion } from "@/db/queries/club-snapshot";
import { computeFlightLine, getAircraftStatusEntry, getFlightLine, getFlightLineJson, loadFleetRecords } from "@/db/queries/fleet-status";
import { clubs, groundingNotices, inspectionItems, squawks } from "@/db/schema";
import { closeSquawk } from "@/lib/actions/fleet/close-squawk";
import { createInspectionItem } from "@/lib/actions/fleet/create-inspection-item";
import { issueGroundingNotice } from "@/lib/actions/fleet/issue-grounding-notice";
import { liftGroundingNotice } from "@/lib/actions/fleet/lift-grounding-notice";
import { logFlight } from "@/lib/actions/fleet/log-flight";
import { recordCompletion } from "@/lib/actions/fleet/record-completion";
import { reportSquawk } from "@/lib/actions/fleet/report-squawk";
import { triageSquawk } from "@/lib/actions/fleet/triage-squawk";
import { buildFlightLine } from "@/lib/fleet/flight-line";
import type { FleetCompletionRecord } from "@/lib/fleet/types";
import { isoDateInTimeZone } from "@/lib/dates";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { callRoute, planeByRegistration, seedFleetOnce } from "./fleet-helpers";

// The flight line is served from a per-club snapshot keyed by the club data version that
// triggers bump on every write (migration 0018). After every kind of write the snapshot must
// equal a fresh computation, and a fresh computation must equal the one from every completion
// of every item (the status reads only the completions that govern each item).

const CLUB = "reedwater";

/** The flight line from the whole completion history, as it was computed before the governing-completion reads. */
function fromWholeHistory(now: Date) {
  const club = clubBySlug(CLUB);
  const records = loadFleetRecords(db(), club.id);
  const completions = db().$client
    .prepare("SELECT id, item_id AS itemId, done_on AS doneOn, hours, expires_on AS expiresOn, meter FROM inspection_completions WHERE club_id = ? ORDER BY rowid")
    .all(club.id) as FleetCompletionRecord[];
  const today = isoDateInTimeZone(now, club.timeZone);
  return buildFlightLine({ ...records, completions }, today, now.toISOString(), { days: club.settings.dueSoonDays, hours: club.settings.dueSoonHours }, club.timeZone);
}

/** Reads twice (the second from the snapshot) and compares both with fresh computations. */
async function expectSnapshotFresh(what: string) {
  const club = clubBySlug(CLUB);
  const now = new Date();
  const fresh = computeFlightLine(db(), club, now);
  expect(getFlightLine(db(), club, now), `${what}: first read`).toEqual(fresh);
  expect(getFlightLine(db(), club, now), `${what}: from the snapshot`).toEqual(fresh);
  expect(JSON.parse(getFlightLineJson(db(), club, now)), `${what}: JSON`).toEqual(JSON.parse(JSON.stringify(fresh)));
  expect(fresh.entries, `${what}: governing completions`).toEqual(fromWholeHistory(now));
  for (const e of fresh.entries) expect(getAircraftStatusEntry(db(), club, e.aircraft.id, now), `${what}: ${e.aircraft.registration}`).toEqual({ ...e, today: fresh.today });
  const res = await callRoute(flightLineRoute, `/api/clubs/${CLUB}/flight-line`, { club: CLUB });
  expect(res.status).toBe(200);
  expect((res.body as { entries: unknown }).entries, `${what}: route`).toEqual(JSON.parse(JSON.stringify(computeFlightLine(db(), club).entries)));
}

/** The route's answer to a poll holding `etag` (none: a first poll). */
async function poll(etag: string | null): Promise<{ status: number; etag: string | null; body: string }> {
  const res = await flightLineRoute(new Request(`http://app.test/api/clubs/${CLUB}/flight-line`, { headers: etag ? { "If-None-Match": etag } : {} }), { params: Promise.resolve({ club: CLUB }) });
  return { status: res.status, etag: res.headers.get("etag"), body: await res.text() };
}

function version() {
  return clubDataVersion(db(), clubBySlug(CLUB).id);
}

/** Runs a write and checks it moved the club's version and left the snapshot equal to a fresh computation. */
async function afterWrite(what: string, write: () => unknown) {
  await expectSnapshotFresh(`before ${what}`);
  const before = version();
  const held = await poll(null);
  expect(held.status).toBe(200);
  expect(held.etag, `${what}: the answer carries a tag`).toMatch(/^"fl-/);
  const unchanged = await poll(held.etag);
  expect([unchanged.status, unchanged.body, unchanged.etag], `${what}: nothing changed → 304, no body`).toEqual([304, "", held.etag]);
  let result: unknown;
  try {
    result = await write();
  } catch (error) {
    // An action that succeeds by redirecting (the framework's redirect signal in these tests).
    if (!(error instanceof Error && error.message.startsWith("redirect:"))) throw error;
  }
  if (result && typeof result === "object" && "ok" in result) expect(result, `${what}: ${JSON.stringify(result)}`).toMatchObject({ ok: true });
  expect(version(), `${what} bumps the club data version`).toBeGreaterThan(before);
  await expectSnapshotFresh(`after ${what}`);
  // The tag held from before the write is not honoured: the poller gets the new flight line whole.
  const after = await poll(held.etag);
  expect(after.status, `${what}: a poll with the old tag gets the new flight line`).toBe(200);
  expect(after.etag).not.toBe(held.etag);
  expect(JSON.parse(after.body).entries).toEqual(JSON.parse(JSON.stringify(computeFlightLine(db(), clubBySlug(CLUB)).entries)));
  expect((await poll(after.etag)).status, `${what}: the new tag is honoured`).toBe(304);
}

describe("flight-line snapshot", () => {
  let planeId = "";
  beforeAll(async () => {
    await seedFleetOnce();
    signInAs("maintenance@hangarline.test");
    planeId = planeByRegistration(CLUB, "N0512L").id;
  });

  it("a logged flight (new meters)", async () => {
    const plane = planeByRegistration(CLUB, "N0512L");
    const h = plane.currentHobbs!;
    const t = plane.currentTach!;
    await afterWrite("log a flight", () =>
      logFlight(EMPTY, form({ club: CLUB, aircraftId: planeId, flownOn: isoDateInTimeZone(new Date(), "America/Chicago"), hobbsOut: String(h), hobbsIn: (h + 20).toFixed(1), tachOut: String(t), tachIn: (t + 20).toFixed(1), dayLandings: "1", nightFullStopLandings: "0", fuelAdded: "0", oilAdded: "0" })),
    );
  });

  it("squawks: reported, triaged grounding, closed", async () => {
    await afterWrite("report a squawk", () => reportSquawk(EMPTY, form({ club: CLUB, aircraftId: planeId, description: "Snapshot test: door seal loose", foundDuring: "preflight" })));
    const sq = db().select().from(squawks).where(and(eq(squawks.aircraftId, planeId), eq(squawks.description, "Snapshot test: door seal loose"))).get()!;
    await afterWrite("triage a squawk", () => triageSquawk(EMPTY, form({ club: CLUB, squawkId: sq.id, triage: "grounding" })));
    await afterWrite("close a squawk", () => closeSquawk(EMPTY, form({ club: CLUB, squawkId: sq.id, repairNotes: "Seal replaced", rtsMechanicName: "Hollis Fairbank", rtsCertificate: "A&P 0003902 IA", rtsOn: isoDateInTimeZone(new Date(), "America/Chicago") })));
  });

  it("grounding notices: issued, lifted", async () => {
    await afterWrite("issue a notice", () => issueGroundingNotice(EMPTY, form({ club: CLUB, aircraftId: planeId, category: "safety", reason: "Snapshot test notice" })));
    const notice = db().select().from(groundingNotices).where(and(eq(groundingNotices.aircraftId, planeId), isNull(groundingNotices.liftedAt))).get()!;
    await afterWrite("lift a notice", () => liftGroundingNotice(EMPTY, form({ club: CLUB, noticeId: notice.id, liftNote: "Checked and found fine", liftMechanicName: "Hollis Fairbank", liftCertificate: "A&P 0003902 IA" })));
  });

  it("inspection items and completions", async () => {
    const oil = db().select().from(inspectionItems).where(and(eq(inspectionItems.aircraftId, planeId), eq(inspectionItems.key, "oil-change"))).get()!;
    const plane = planeByRegistration(CLUB, "N0512L");
    await afterWrite("record a completion", () => recordCompletion(EMPTY, form({ club: CLUB, itemId: oil.id, doneOn: isoDateInTimeZone(new Date(), "America/Chicago"), hours: String(plane.currentTach), mechanicName: "Hollis Fairbank", mechanicCertificate: "A&P 0003902 IA" })));
    await afterWrite("add an inspection item", () => createInspectionItem(EMPTY, form({ club: CLUB, aircraftId: planeId, name: "AD X0-0002 snapshot check", origin: "directive", ruleKind: "calendar-months", months: "12", required: "on", source: "AD X0-0002 (invented)" })));
  });

  it("aircraft and club settings changed behind the actions, and a future notice taking effect", async () => {
    await afterWrite("aircraft meters corrected", () => db().$client.prepare("UPDATE aircraft SET current_tach = current_tach + 500 WHERE id = ?").run(planeId));
    const club = clubBySlug(CLUB);
    await afterWrite("club settings", () => db().update(clubs).set({ settings: { ...club.settings, dueSoonDays: club.settings.dueSoonDays + 200 } }).where(eq(clubs.id, club.id)).run());
    await afterWrite("aircraft retired", () => db().$client.prepare("UPDATE aircraft SET retired_at = ? WHERE id = ?").run(Date.now(), planeByRegistration(CLUB, "N0527L").id));

    // A notice that takes effect in a moment: the snapshot must not outlive that instant.
    const soon = new Date(Date.now() + 60_000);
    await afterWrite("future notice", () =>
      db().insert(groundingNotices).values({ clubId: club.id, aircraftId: planeId, category: "maintenance", reason: "Snapshot test: grounded from a set time", effectiveAt: soon, issuedById: signInAs("maintenance@hangarline.test")!.id }).run(),
    );
    const fresh = clubBySlug(CLUB);
    const before = getFlightLine(db(), fresh).entries.find((e) => e.aircraft.id === planeId)!;
    expect(before.reasons.some((r) => r.code === "notice-pending")).toBe(true);
    const later = new Date(soon.getTime() + 1_000);
    const after = getFlightLine(db(), fresh, later).entries.find((e) => e.aircraft.id === planeId)!;
    expect(after.status).toBe("grounded");
    expect(getFlightLine(db(), fresh, later)).toEqual(computeFlightLine(db(), fresh, later));
  });

  it("a write rolled back leaves the version and the snapshot as they were", async () => {
    await expectSnapshotFresh("before a rolled-back write");
    const before = version();
    const entryBefore = getAircraftStatusEntry(db(), clubBySlug(CLUB), planeId)!;
    expect(() =>
      db().transaction((tx) => {
        tx.insert(groundingNotices).values({ clubId: clubBySlug(CLUB).id, aircraftId: planeId, category: "safety", reason: "Snapshot test: rolled back", effectiveAt: new Date(Date.now() - 1_000), issuedById: signInAs("maintenance@hangarline.test")!.id }).run();
        // Read inside the transaction: its own write shows (the kept snapshot no longer holds there).
        const club = clubBySlug(CLUB);
        const inside = getAircraftStatusEntry(tx as never, club, planeId)!;
        expect(inside).not.toEqual(entryBefore);
        expect(inside.reasons.filter((r) => r.grounding).length).toBeGreaterThan(entryBefore.reasons.filter((r) => r.grounding).length);
        const at = new Date();
        expect(getFlightLine(tx as never, club, at)).toEqual(computeFlightLine(tx as never, club, at));
        throw new Error("roll back");
      }),
    ).toThrow("roll back");
    expect(version()).toBe(before);
    await expectSnapshotFresh("after a rolled-back write");
    expect(getAircraftStatusEntry(db(), clubBySlug(CLUB), planeId)).toEqual(entryBefore);
  });

  it("the snapshot is keyed by the club's date", () => {
    const club = clubBySlug(CLUB);
    const today = getFlightLine(db(), club);
    const tomorrow = getFlightLine(db(), club, new Date(Date.now() + 86_400_000));
    expect(tomorrow.today).not.toBe(today.today);
    expect(tomorrow).toEqual(computeFlightLine(db(), club, new Date(Date.parse(tomorrow.generatedAt))));
  });
});
