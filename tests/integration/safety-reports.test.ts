import { beforeAll, describe, expect, it, vi } from "vitest";
import { eq } from "drizzle-orm";
import { GET as reportRoute } from "@/app/api/clubs/[club]/safety/reports/[reportId]/route";
import { emailOutbox, groundingNotices, safetyReportEvents, safetyReports, users } from "@/db/schema";
import { listOwnNamedReports } from "@/db/queries/safety-reports";
import { fileReport } from "@/lib/actions/safety/file-report";
import { groundFromReport } from "@/lib/actions/safety/ground-from-report";
import { triageReport } from "@/lib/actions/safety/triage-report";
import { isoDateInTimeZone } from "@/lib/dates";
import { startOfClubDay } from "@/lib/safety/report-digest";
import { EMPTY, clubBySlug, db, expectRedirect, form, signInAs } from "./helpers";
import { callRoute, planeByRegistration, seedFleetOnce } from "./fleet-helpers";

const CLUB = "reedwater";
const story = "The fuel sample from the left sump showed water twice before it ran clear.";

function reportForm(extra: Record<string, string | string[]> = {}) {
  return form({ club: CLUB, occurredOn: "2026-01-10", location: "Tie-down row C", whatHappened: story, contributingFactors: ["aircraft_equipment", "weather"], ...extra });
}

const userId = (email: string) => db().select().from(users).where(eq(users.email, email)).get()!.id;
/** Rows in every table of the database, by table name. */
function tableCounts(): Record<string, number> {
  const tables = (db().$client.prepare("select name from sqlite_master where type = 'table' and name not like 'sqlite_%'").all() as { name: string }[]).map((t) => t.name);
  return Object.fromEntries(tables.map((t) => [t, (db().$client.prepare(`select count(*) as n from "${t}"`).get() as { n: number }).n]));
}

/** Everything an action answers: the state it returns (with `redirectTo`, where the browser goes next). */
async function answerOf(run: () => Promise<unknown>): Promise<unknown> {
  return { state: await run() };
}

const read = (reportId: string, club = CLUB) => callRoute(reportRoute, `/api/clubs/${club}/safety/reports/${reportId}`, { club, reportId });

describe("confidential safety reports", () => {
  let anonymousId = "";
  let namedId = "";

  beforeAll(async () => {
    await seedFleetOnce();
  });

  it("an anonymous report stores no reporter at all, and filing it creates nothing else", async () => {
    signInAs("member@hangarline.test");
    const club = clubBySlug(CLUB);
    const before = tableCounts();
    const spies = (["log", "info", "warn", "error", "debug"] as const).map((m) => vi.spyOn(console, m).mockImplementation(() => undefined));
    const to = await expectRedirect(() => fileReport(EMPTY, reportForm({ anonymous: "on" })));
    for (const spy of spies) expect(spy).not.toHaveBeenCalled();
    spies.forEach((spy) => spy.mockRestore());
    expect(to).toBe(`/clubs/${CLUB}/safety/reports?filed=1`);
    // Only the report itself is written: no outbox row, audit row, upload, event or anything else.
    const after = tableCounts();
    expect(Object.keys(after).filter((t) => after[t] !== before[t])).toEqual(["safety_reports"]);
    expect(after.safety_reports).toBe(before.safety_reports! + 1);
    const row = db().select().from(safetyReports).all().find((r) => r.whatHappened === story && r.anonymous)!;
    anonymousId = row.id;
    // The column holds no value — checked in the raw table, not through the app's types.
    const raw = db().$client.prepare("select reporter_id, created_at, updated_at from safety_reports where id = ?").get(row.id) as { reporter_id: string | null; created_at: number; updated_at: number };
    expect(raw.reporter_id).toBeNull();
    // Its only time is the first instant of the club day it was filed on.
    const dayStart = startOfClubDay(isoDateInTimeZone(new Date(), club.timeZone), club.timeZone).getTime();
    expect([raw.created_at, raw.updated_at]).toEqual([dayStart, dayStart]);
    const columns = (db().$client.prepare("pragma table_info(safety_reports)").all() as { name: string }[]).map((c) => c.name);
    expect(columns.filter((c) => /ip|agent|session/i.test(c))).toEqual([]);
    const me = userId("member@hangarline.test");
    expect(JSON.stringify(db().select().from(safetyReportEvents).all())).not.toContain(me);
    // The database refuses to attach a reporter to an anonymous report later.
    expect(() => db().$client.prepare("update safety_reports set reporter_id = ? where id = ?").run(me, row.id)).toThrow(/stores no reporter/);
    expect(() => db().$client.prepare("update safety_reports set anonymous = 0 where id = ?").run(row.id)).toThrow(/stores no reporter/);
  });

  it("the filer gets the same answer for a named and an anonymous report; only the named one tells the officers at once", async () => {
    signInAs("member@hangarline.test");
    const anonymousAnswer = await answerOf(() => fileReport(EMPTY, reportForm({ anonymous: "on", location: "Wash rack" })));
    const outboxBefore = db().select().from(emailOutbox).all().length;
    const namedAnswer = await answerOf(() => fileReport(EMPTY, reportForm({ location: "Wash rack" })));
    expect(namedAnswer).toEqual(anonymousAnswer);
    expect(anonymousAnswer).toMatchObject({ state: { ok: true, redirectTo: `/clubs/${CLUB}/safety/reports?filed=1` } });
    const notices = db().select().from(emailOutbox).all().slice(outboxBefore);
    expect(notices.map((n) => [n.toAddress, n.subject])).toEqual([["safety@hangarline.test", "A named safety report was filed"]]);
    // The named notice says nothing of anonymous reports, nor who filed it.
    expect(JSON.stringify(notices)).not.toMatch(/anonym|member@hangarline|Rowan|Pike/i);
  });

  it("an anonymous report is unreadable by its filer and by club admins; the safety officer reads it", async () => {
    signInAs("member@hangarline.test");
    expect((await read(anonymousId)).status).toBe(404);
    expect(listOwnNamedReports(db(), clubBySlug(CLUB).id, userId("member@hangarline.test")).map((r) => r.id)).not.toContain(anonymousId);
    signInAs("admin@hangarline.test");
    expect((await read(anonymousId)).status).toBe(404);
    signInAs("safety@hangarline.test");
    const officer = await read(anonymousId);
    expect(officer.status).toBe(200);
    expect(officer.body).toMatchObject({ report: { anonymous: true, reporter: null, whatHappened: story } });
  });

  it("a named report is readable by its reporter and the safety officer only", async () => {
    signInAs("member@hangarline.test");
    await expectRedirect(() => fileReport(EMPTY, reportForm({ location: "Taxiway B" })));
    namedId = db().select().from(safetyReports).where(eq(safetyReports.location, "Taxiway B")).get()!.id;
    expect(db().select().from(safetyReports).where(eq(safetyReports.id, namedId)).get()!.reporterId).toBe(userId("member@hangarline.test"));
    expect((await read(namedId)).status).toBe(200);
    signInAs("pilot2@hangarline.test");
    expect((await read(namedId)).status).toBe(404);
    signInAs("admin@hangarline.test");
    expect((await read(namedId)).status).toBe(404);
    signInAs("safety@hangarline.test");
    expect((await read(namedId)).body).toMatchObject({ report: { anonymous: false, reporter: "Rowan Pike" } });
    signInAs("cottonwood.maint@hangarline.test"); // a safety officer of another club
    expect((await read(namedId, "cottonwood-flyers")).status).toBe(404);
  });

  it("refuses bad input with a message per field and writes nothing", async () => {
    signInAs("member@hangarline.test");
    const before = db().select().from(safetyReports).all().length;
    const bad = await fileReport(EMPTY, form({ club: CLUB, occurredOn: "soon", location: "", whatHappened: "short", contributingFactors: ["gremlins"] }));
    expect(Object.keys(bad.fieldErrors).sort()).toEqual(["contributingFactors.0", "location", "occurredOn", "whatHappened"]);
    const future = await fileReport(EMPTY, reportForm({ occurredOn: "2199-01-01" }));
    expect(future.fieldErrors.occurredOn).toEqual(["The date cannot be in the future."]);
    const foreign = await fileReport(EMPTY, reportForm({ aircraftId: planeByRegistration("cottonwood-flyers", "N0471C").id }));
    expect(foreign.fieldErrors.aircraftId?.[0]).toMatch(/club's aircraft/);
    expect(db().select().from(safetyReports).all().length).toBe(before);
  });

  it("the safety officer triages; a note is needed to close; members and admins cannot triage", async () => {
    signInAs("member@hangarline.test");
    expect((await triageReport(EMPTY, form({ club: CLUB, reportId: namedId, toStatus: "reviewing" }))).ok).toBe(false);
    signInAs("admin@hangarline.test");
    expect((await triageReport(EMPTY, form({ club: CLUB, reportId: namedId, toStatus: "reviewing" }))).ok).toBe(false);
    signInAs("safety@hangarline.test");
    expect((await triageReport(EMPTY, form({ club: CLUB, reportId: namedId, toStatus: "action_taken" }))).fieldErrors.toStatus).toBeDefined();
    expect((await triageReport(EMPTY, form({ club: CLUB, reportId: namedId, toStatus: "reviewing" }))).ok).toBe(true);
    const noNote = await triageReport(EMPTY, form({ club: CLUB, reportId: namedId, toStatus: "closed" }));
    expect(noNote.fieldErrors.note).toEqual(["Say why the report is closed."]);
    expect((await triageReport(EMPTY, form({ club: CLUB, reportId: namedId, toStatus: "closed", note: "Hold line painted." }))).ok).toBe(true);
    const events = db().select().from(safetyReportEvents).where(eq(safetyReportEvents.reportId, namedId)).all();
    expect(events.map((e) => [e.fromStatus, e.toStatus])).toEqual([["received", "reviewing"], ["reviewing", "closed"]]);
  });

  it("the safety officer grounds an aircraft from a report through the fleet's grounding notice", async () => {
    const plane = planeByRegistration(CLUB, "N0527L");
    signInAs("member@hangarline.test");
    const denied = await groundFromReport(EMPTY, form({ club: CLUB, reportId: anonymousId, aircraftId: plane.id, reason: "Water in the fuel twice; cap seal suspected." }));
    expect(denied.ok).toBe(false);
    signInAs("safety@hangarline.test");
    const state = await groundFromReport(EMPTY, form({ club: CLUB, reportId: anonymousId, aircraftId: plane.id, reason: "Water in the fuel twice; cap seal suspected." }));
    expect(state.ok).toBe(true);
    const noticeId = (state.data as { noticeId: string }).noticeId;
    expect(db().select().from(groundingNotices).where(eq(groundingNotices.id, noticeId)).get()).toMatchObject({ aircraftId: plane.id, category: "safety", liftedAt: null });
    expect(db().select().from(safetyReportEvents).where(eq(safetyReportEvents.reportId, anonymousId)).all()).toEqual([expect.objectContaining({ kind: "grounding", groundingNoticeId: noticeId })]);
  });
});
