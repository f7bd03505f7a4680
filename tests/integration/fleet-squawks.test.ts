import { beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { GET as flightLineRoute } from "@/app/api/clubs/[club]/flight-line/route";
import { GET as squawkRoute } from "@/app/api/clubs/[club]/squawks/[squawkId]/route";
import { auditLog, squawkEvents, squawks } from "@/db/schema";
import { closeSquawk } from "@/lib/actions/fleet/close-squawk";
import { reportSquawk } from "@/lib/actions/fleet/report-squawk";
import { triageSquawk } from "@/lib/actions/fleet/triage-squawk";
import type { FlightLineEntry } from "@/lib/fleet/types";
import { EMPTY, db, squawkIdOf, form, signInAs } from "./helpers";
import { callRoute, planeByRegistration, seedFleetOnce } from "./fleet-helpers";

const CLUB = "reedwater";

async function lineEntry(registration: string): Promise<FlightLineEntry> {
  const { status, body } = await callRoute(flightLineRoute, `/api/clubs/${CLUB}/flight-line`, { club: CLUB });
  expect(status).toBe(200);
  const entry = (body as { entries: FlightLineEntry[] }).entries.find((e) => e.aircraft.registration === registration);
  if (!entry) throw new Error(`${registration} not on the flight line`);
  return entry;
}

describe("squawks: report, triage, return to service", () => {
  let squawkId = "";
  beforeAll(async () => {
    await seedFleetOnce();
  });

  it("the demo fleet starts as the scenario says", async () => {
    signInAs("member@hangarline.test");
    expect((await lineEntry("N0512L")).status).toBe("grounded");
    expect((await lineEntry("N0527L")).status).toBe("limited");
    expect((await lineEntry("N0556L")).status).toBe("flyable");
  });

  it("a member reports a grounding squawk and the JSON route says grounded with that reason", async () => {
    signInAs("member@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0556L");
    squawkId = await squawkIdOf(() => reportSquawk(EMPTY, form({ club: CLUB, aircraftId: plane.id, description: "Elevator trim tab loose at the hinge", foundDuring: "preflight", suspectedGrounding: "on" })));
    const entry = await lineEntry("N0556L");
    expect(entry.status).toBe("grounded");
    expect(entry.reasons).toContainEqual({ code: "squawk-untriaged", text: "Squawk reported as affecting airworthiness, awaiting triage: Elevator trim tab loose at the hinge", grounding: true });
    expect(entry.openSquawks.map((s) => s.id)).toContain(squawkId);
  });

  it("a member cannot triage or close, and nothing changes", async () => {
    signInAs("member@hangarline.test");
    const triage = await triageSquawk(EMPTY, form({ club: CLUB, squawkId, triage: "note" }));
    expect(triage.ok).toBe(false);
    expect(triage.message).toMatch(/maintenance officer/i);
    const close = await closeSquawk(EMPTY, form({ club: CLUB, squawkId, repairNotes: "Fixed it myself", rtsMechanicName: "Me", rtsCertificate: "none", rtsOn: "2026-01-01" }));
    expect(close.ok).toBe(false);
    const row = db().select().from(squawks).where(eq(squawks.id, squawkId)).get()!;
    expect(row).toMatchObject({ status: "open", triage: "untriaged" });
  });

  it("deferring needs the limitation, the placard and who determined it (14 CFR 91.213(d))", async () => {
    signInAs("maintenance@hangarline.test");
    const state = await triageSquawk(EMPTY, form({ club: CLUB, squawkId, triage: "deferred" }));
    expect(state.ok).toBe(false);
    expect(Object.keys(state.fieldErrors).sort()).toEqual(["deferralDeterminedBy", "limitation", "placarded"]);
    expect(state.fieldErrors.placarded?.[0]).toMatch(/placarded inoperative/);
  });

  it("maintenance triages as grounding, then records the repair and return to service → flyable", async () => {
    const maint = signInAs("maintenance@hangarline.test")!;
    expect((await triageSquawk(EMPTY, form({ club: CLUB, squawkId, triage: "grounding", note: "Hinge bolt backing out" }))).ok).toBe(true);
    expect((await lineEntry("N0556L")).reasons[0]).toMatchObject({ code: "squawk-grounding", grounding: true });

    const missing = await closeSquawk(EMPTY, form({ club: CLUB, squawkId, repairNotes: "Bolt replaced and safetied", rtsOn: "2026-01-01" }));
    expect(missing.ok).toBe(false);
    expect(missing.fieldErrors.rtsMechanicName?.[0]).toMatch(/mechanic/);
    expect(missing.fieldErrors.rtsCertificate?.[0]).toMatch(/certificate/);

    const closed = await closeSquawk(EMPTY, form({ club: CLUB, squawkId, repairNotes: "Bolt replaced and safetied", rtsMechanicName: "Petra Voskuijlen", rtsCertificate: "A&P 0005168", rtsOn: "2026-01-01" }));
    expect(closed).toMatchObject({ ok: true });
    const entry = await lineEntry("N0556L");
    expect(entry.status).toBe("flyable");
    expect(entry.openSquawks).toHaveLength(0);

    const row = db().select().from(squawks).where(eq(squawks.id, squawkId)).get()!;
    expect(row).toMatchObject({ status: "closed", rtsMechanicName: "Petra Voskuijlen", rtsCertificate: "A&P 0005168", closedById: maint.id });
    const audit = db().select().from(auditLog).where(and(eq(auditLog.subjectId, squawkId), eq(auditLog.action, "squawk.close"))).all();
    expect(audit).toHaveLength(1);
  });

  it("keeps every transition with who and when; the squawk route shows them", async () => {
    const events = db().select().from(squawkEvents).where(eq(squawkEvents.squawkId, squawkId)).orderBy(squawkEvents.createdAt).all();
    expect(events.map((e) => e.kind)).toEqual(["reported", "triaged", "closed"]);
    expect(events.every((e) => e.actorId && e.createdAt instanceof Date)).toBe(true);
    signInAs("member@hangarline.test");
    const { status, body } = await callRoute(squawkRoute, `/api/clubs/${CLUB}/squawks/${squawkId}`, { club: CLUB, squawkId });
    expect(status).toBe(200);
    expect((body as { events: { kind: string; actorName: string }[] }).events.map((e) => `${e.kind}:${e.actorName}`)).toEqual(["reported:Rowan Pike", "triaged:Mei Lindqvist", "closed:Mei Lindqvist"]);
  });

  it("refuses to delete or rewrite history at the database itself", () => {
    expect(() => db().delete(squawkEvents).where(eq(squawkEvents.squawkId, squawkId)).run()).toThrow(/never deleted/);
    expect(() => db().update(squawkEvents).set({ note: "rewritten" }).where(eq(squawkEvents.squawkId, squawkId)).run()).toThrow(/never updated/);
    expect(() => db().delete(squawks).where(eq(squawks.id, squawkId)).run()).toThrow(/never deleted/);
  });

  it("a deferred, placarded squawk makes the aircraft flyable with limits and says what is not allowed", async () => {
    signInAs("member@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0556L");
    const id = await squawkIdOf(() => reportSquawk(EMPTY, form({ club: CLUB, aircraftId: plane.id, description: "Right navigation light out", foundDuring: "postflight" })));
    expect((await lineEntry("N0556L")).status).toBe("unknown"); // untriaged: nobody has looked yet
    signInAs("maintenance@hangarline.test");
    const triaged = await triageSquawk(EMPTY, form({ club: CLUB, squawkId: id, triage: "deferred", limitation: "No night flight", placarded: "on", deferralDeterminedBy: "Hollis Fairbank, A&P 0003902 IA" }));
    expect(triaged.ok).toBe(true);
    const entry = await lineEntry("N0556L");
    expect(entry.status).toBe("limited");
    expect(entry.reasons[0]!.text).toBe("Deferred, placarded inoperative (14 CFR 91.213(d)): Right navigation light out. Limitation: No night flight");
  });

  it("refuses a squawk without a description, with the field's message, writing nothing", async () => {
    signInAs("member@hangarline.test");
    const before = db().select().from(squawks).all().length;
    const plane = planeByRegistration(CLUB, "N0534L");
    const state = await reportSquawk(EMPTY, form({ club: CLUB, aircraftId: plane.id, description: "", foundDuring: "sometime" }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.description?.[0]).toMatch(/what you found/);
    expect(state.fieldErrors.foundDuring?.[0]).toMatch(/when you found it/);
    expect(db().select().from(squawks).all().length).toBe(before);
  });
});
