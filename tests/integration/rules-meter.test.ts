import { beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { GET as aircraftDetailRoute } from "@/app/api/clubs/[club]/aircraft/[aircraftId]/route";
import { countSquawkAlerts } from "@/db/queries/fleet-squawks";
import { listItems } from "@/db/queries/fleet";
import { auditLog, bookings, emailOutbox, inspectionCompletions, meterConversions, squawks, users } from "@/db/schema";
import { recordCompletion } from "@/lib/actions/fleet/record-completion";
import { recordMeterConversion } from "@/lib/actions/fleet/record-meter-conversion";
import { reportSquawk } from "@/lib/actions/fleet/report-squawk";
import { updateAircraft } from "@/lib/actions/fleet/update-aircraft";
import type { FlightLineEntry } from "@/lib/fleet/types";
import { EMPTY, clubBySlug, db, form, signInAs, squawkIdOf } from "./helpers";
import { callRoute, planeByRegistration, seedFleetOnce } from "./fleet-helpers";

const CLUB = "reedwater";

async function detail(aircraftId: string) {
  const { status, body } = await callRoute(aircraftDetailRoute, `/api/clubs/${CLUB}/aircraft/${aircraftId}`, { club: CLUB, aircraftId });
  expect(status).toBe(200);
  return body as FlightLineEntry & { today: string };
}

/** The aircraft form as it would post the record unchanged, with some fields changed. */
function aircraftForm(registration: string, change: Record<string, string> = {}): FormData {
  const p = planeByRegistration(CLUB, registration);
  const fields: Record<string, string> = {
    club: CLUB, aircraftId: p.id, registration: p.registration, make: p.make, model: p.model, typeGroup: p.typeGroup, category: p.category, classRating: p.classRating,
    hourlyRate: (p.hourlyRateMinor / 100).toFixed(2), rateMeter: p.rateMeter, maintenanceMeter: p.maintenanceMeter,
    currentHobbs: p.currentHobbs!.toFixed(1), currentTach: p.currentTach!.toFixed(1),
    ...(p.usedForInstruction ? { usedForInstruction: "on" } : {}), ...(p.usedForHire ? { usedForHire: "on" } : {}),
    ...(p.ifrEquipped ? { ifrEquipped: "on" } : {}), ...(p.usedForIfr ? { usedForIfr: "on" } : {}),
    ...change,
  };
  return form(fields);
}

function conversionsOf(aircraftId: string) {
  return db().select().from(meterConversions).where(eq(meterConversions.aircraftId, aircraftId)).all();
}

function auditOf(action: string, subjectId: string) {
  return db().select().from(auditLog).where(and(eq(auditLog.action, action), eq(auditLog.subjectId, subjectId))).all();
}

describe("meter provenance: switching the meter inspections count by", () => {
  beforeAll(async () => {
    await seedFleetOnce();
  });

  it("every demo completion carries the meter it was read on", () => {
    const plane = planeByRegistration(CLUB, "N0527L");
    const rows = db().select().from(inspectionCompletions).where(eq(inspectionCompletions.aircraftId, plane.id)).all();
    expect(rows.length).toBeGreaterThan(0);
    expect(rows.every((r) => r.meter === "tach")).toBe(true);
  });

  it("refuses a switch without a conversion reading, and writes nothing", async () => {
    signInAs("maintenance@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0527L");
    const state = await updateAircraft(EMPTY, aircraftForm("N0527L", { maintenanceMeter: "hobbs" }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.conversionReading?.[0]).toMatch(/Hobbs reading at the switch/);
    expect(planeByRegistration(CLUB, "N0527L").maintenanceMeter).toBe("tach");
    expect(conversionsOf(plane.id)).toHaveLength(0);
    expect(auditOf("aircraft.update", plane.id)).toHaveLength(0);
  });

  it("refuses a conversion reading that is not the new meter's current reading", async () => {
    signInAs("maintenance@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0527L");
    const state = await updateAircraft(EMPTY, aircraftForm("N0527L", { maintenanceMeter: "hobbs", conversionReading: "1234.5" }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.conversionReading?.[0]).toMatch(/must be the current Hobbs/);
    expect(conversionsOf(plane.id)).toHaveLength(0);
  });

  it("accepts the switch with the conversion reading, records it, and the 100-hour becomes Status unknown naming both meters", async () => {
    signInAs("maintenance@hangarline.test");
    const before = planeByRegistration(CLUB, "N0527L");
    expect((await detail(before.id)).status).toBe("limited"); // the demo's deferred squawk
    const state = await updateAircraft(EMPTY, aircraftForm("N0527L", { maintenanceMeter: "hobbs", conversionReading: before.currentHobbs!.toFixed(1) }));
    expect(state.ok).toBe(true);
    expect(state.message).toMatch(/Status unknown/);
    expect(planeByRegistration(CLUB, "N0527L").maintenanceMeter).toBe("hobbs");
    const [conversion] = conversionsOf(before.id);
    expect(conversion).toMatchObject({ completionId: null, fromMeter: "tach", fromReading: before.currentTach, toMeter: "hobbs", toReading: before.currentHobbs });
    expect(auditOf("aircraft.meter.switch", before.id)).toHaveLength(1);

    const d = await detail(before.id);
    expect(d.status).toBe("unknown");
    const reason = d.reasons.find((r) => r.code === "other-meter" && r.text.startsWith("100-hour inspection"));
    expect(reason?.text).toMatch(/on the tach, but inspections now count by the Hobbs/);
    expect(d.due.find((x) => x.key === "100-hour")?.otherMeter).toEqual({ completionMeter: "tach", currentMeter: "hobbs" });
  });

  it("maintenance records where the last completions stand on the Hobbs, and the status is computed again", async () => {
    signInAs("maintenance@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0527L");
    const items = listItems(db(), clubBySlug(CLUB).id, plane.id);
    signInAs("member@hangarline.test");
    const refused = await recordMeterConversion(EMPTY, form({ club: CLUB, itemId: items.find((i) => i.key === "100-hour")!.id, reading: "4800.0" }));
    expect(refused.ok).toBe(false);
    signInAs("maintenance@hangarline.test");
    const tooHigh = await recordMeterConversion(EMPTY, form({ club: CLUB, itemId: items.find((i) => i.key === "100-hour")!.id, reading: "99999.0" }));
    expect(tooHigh.fieldErrors.reading?.[0]).toMatch(/past the aircraft's current Hobbs/);
    // The 100-hour (governed by its own or the annual's completion) and the oil change count hours.
    for (const key of ["100-hour", "oil-change"]) {
      const d = await detail(plane.id);
      const row = d.due.find((x) => x.key === key)!;
      if (!row.otherMeter) continue;
      const onHobbs = (plane.currentHobbs! - (plane.currentTach! - row.lastDoneHours!)).toFixed(1);
      const state = await recordMeterConversion(EMPTY, form({ club: CLUB, itemId: items.find((i) => i.key === key)!.id, reading: onHobbs }));
      expect(state.ok).toBe(true);
    }
    const after = await detail(plane.id);
    expect(after.reasons.some((r) => r.code === "other-meter")).toBe(false);
    expect(after.status).toBe("limited"); // back to the demo's deferred squawk only
    expect(db().select().from(auditLog).where(eq(auditLog.action, "inspection.meter.convert")).all().length).toBeGreaterThan(0);
  });

  it("a completion recorded after the switch is stored on the new meter", async () => {
    signInAs("maintenance@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0527L");
    const item = listItems(db(), clubBySlug(CLUB).id, plane.id).find((i) => i.key === "oil-change")!;
    const today = (await detail(plane.id)).today;
    const state = await recordCompletion(EMPTY, form({ club: CLUB, itemId: item.id, doneOn: today, hours: plane.currentHobbs!.toFixed(1), mechanicName: "Petra Voskuijlen", mechanicCertificate: "A&P 0005168" }));
    expect(state.ok).toBe(true);
    const rows = db().select().from(inspectionCompletions).where(eq(inspectionCompletions.itemId, item.id)).all();
    expect(rows.at(-1)?.meter).toBe("hobbs");
  });
});

describe("meter provenance: lowering a current reading", () => {
  beforeAll(async () => {
    await seedFleetOnce();
  });

  it("refuses an admin (no maintenance role) lowering the tach, and writes nothing", async () => {
    const plane = planeByRegistration(CLUB, "N0534L");
    signInAs("admin@hangarline.test");
    const state = await updateAircraft(EMPTY, aircraftForm("N0534L", { currentTach: (plane.currentTach! - 10).toFixed(1), readingChangeReason: "Typo" }));
    expect(state.ok).toBe(false);
    expect(state.message).toMatch(/Only maintenance may lower/);
    expect(state.fieldErrors.currentTach?.[0]).toMatch(/Only maintenance may lower the tach/);
    expect(planeByRegistration(CLUB, "N0534L").currentTach).toBe(plane.currentTach);
    expect(auditOf("aircraft.meter.lower", plane.id)).toHaveLength(0);
  });

  it("refuses maintenance lowering without a reason", async () => {
    const plane = planeByRegistration(CLUB, "N0534L");
    signInAs("maintenance@hangarline.test");
    const state = await updateAircraft(EMPTY, aircraftForm("N0534L", { currentHobbs: (plane.currentHobbs! - 2).toFixed(1) }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.readingChangeReason?.[0]).toMatch(/Say why the reading goes down/);
    expect(planeByRegistration(CLUB, "N0534L").currentHobbs).toBe(plane.currentHobbs);
  });

  it("lets maintenance lower it with a reason, audited with the reason", async () => {
    const plane = planeByRegistration(CLUB, "N0534L");
    signInAs("maintenance@hangarline.test");
    const lower = (plane.currentHobbs! - 2).toFixed(1);
    const state = await updateAircraft(EMPTY, aircraftForm("N0534L", { currentHobbs: lower, readingChangeReason: "Hobbs meter replaced; new unit set to the logbook total" }));
    expect(state.ok).toBe(true);
    expect(planeByRegistration(CLUB, "N0534L").currentHobbs).toBe(Number(lower));
    const [entry] = auditOf("aircraft.meter.lower", plane.id);
    expect(entry?.before).toEqual({ currentHobbs: plane.currentHobbs });
    expect(entry?.after).toEqual({ currentHobbs: Number(lower), reason: "Hobbs meter replaced; new unit set to the logbook total" });
  });

  it("raising a reading stays an ordinary edit", async () => {
    const plane = planeByRegistration(CLUB, "N0534L");
    signInAs("admin@hangarline.test");
    const state = await updateAircraft(EMPTY, aircraftForm("N0534L", { currentHobbs: (plane.currentHobbs! + 0.5).toFixed(1) }));
    expect(state.ok).toBe(true);
  });
});

describe("a squawk marked 'may make the aircraft unsafe' is e-mailed at once", () => {
  beforeAll(async () => {
    await seedFleetOnce();
  });

  function outboxAlerts() {
    return db().select().from(emailOutbox).where(eq(emailOutbox.template, "squawk-alert")).all();
  }

  it("queues e-mails to maintenance and the upcoming booking holders, not the reporter, in the same write", async () => {
    const club = clubBySlug(CLUB);
    const plane = planeByRegistration(CLUB, "N0549L");
    const holder = db().select().from(users).where(eq(users.email, "pilot2@hangarline.test")).get()!;
    const start = new Date(Date.now() + 3 * 86_400_000);
    db().insert(bookings).values({ clubId: club.id, aircraftId: plane.id, userId: holder.id, startsAt: start, endsAt: new Date(start.getTime() + 2 * 3_600_000) }).run();
    const before = outboxAlerts().length;

    signInAs("member@hangarline.test");
    let answer = "";
    const squawkId = await squawkIdOf(async () => {
      const state = await reportSquawk(EMPTY, form({ club: CLUB, aircraftId: plane.id, description: "Fuel smell in the cabin after start", foundDuring: "preflight", suspectedGrounding: "on" }));
      answer = state.message;
      return state;
    });
    // The answer says only what happened: who was e-mailed, counted.
    expect(answer).toMatch(/^Squawk reported: “Fuel smell in the cabin after start”\. .*Maintenance \(2 people\).*e-mailed\.$/);
    expect(db().select().from(squawks).where(eq(squawks.id, squawkId)).get()?.suspectedGrounding).toBe(true);

    const sent = outboxAlerts().slice(before);
    const addresses = sent.map((m) => m.toAddress).sort();
    expect(addresses).toContain("maintenance@hangarline.test");
    expect(addresses).toContain("mechanic@hangarline.test");
    expect(addresses).toContain("pilot2@hangarline.test");
    expect(addresses).not.toContain("member@hangarline.test");
    expect(sent.find((m) => m.toAddress === "pilot2@hangarline.test")?.payload).toMatchObject({ because: "booking", registration: "N0549L", description: "Fuel smell in the cabin after start", squawkId });
    expect(sent.find((m) => m.toAddress === "maintenance@hangarline.test")?.payload).toMatchObject({ because: "maintenance" });
    expect(countSquawkAlerts(db(), club.id, squawkId)).toEqual({ maintenance: 2, booking: 1 });
  });

  it("a plain squawk e-mails nobody and claims nothing", async () => {
    const club = clubBySlug(CLUB);
    const plane = planeByRegistration(CLUB, "N0549L");
    const before = outboxAlerts().length;
    signInAs("member@hangarline.test");
    const state = await reportSquawk(EMPTY, form({ club: CLUB, aircraftId: plane.id, description: "Sun visor clip cracked", foundDuring: "postflight" }));
    expect(state.message).toBe("Squawk reported: “Sun visor clip cracked”.");
    const squawkId = (state.data as { squawkId: string }).squawkId;
    expect(outboxAlerts().length).toBe(before);
    expect(countSquawkAlerts(db(), club.id, squawkId)).toEqual({ maintenance: 0, booking: 0 });
  });

  it("a replayed report queues its e-mails once", async () => {
    const plane = planeByRegistration(CLUB, "N0556L");
    const before = outboxAlerts().length;
    signInAs("member@hangarline.test");
    const fd = () => form({ club: CLUB, aircraftId: plane.id, description: "Nose strut leaking fluid", foundDuring: "preflight", suspectedGrounding: "on", idempotencyKey: "0f1e2d3c-4b5a-4968-8776-a5b4c3d2e1f0" });
    expect((await reportSquawk(EMPTY, fd())).ok).toBe(true);
    const once = outboxAlerts().length - before;
    expect(once).toBeGreaterThan(0);
    expect((await reportSquawk(EMPTY, fd())).ok).toBe(true);
    expect(outboxAlerts().length - before).toBe(once);
  });
});
