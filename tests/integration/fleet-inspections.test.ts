import { beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { GET as aircraftDetailRoute } from "@/app/api/clubs/[club]/aircraft/[aircraftId]/route";
import { listItems } from "@/db/queries/fleet";
import { aircraft, auditLog, inspectionItems } from "@/db/schema";
import { createAircraft } from "@/lib/actions/fleet/create-aircraft";
import { createInspectionItem } from "@/lib/actions/fleet/create-inspection-item";
import { recordCompletion } from "@/lib/actions/fleet/record-completion";
import { updateAircraft } from "@/lib/actions/fleet/update-aircraft";
import { updateInspectionItem } from "@/lib/actions/fleet/update-inspection-item";
import type { FlightLineEntry } from "@/lib/fleet/types";
import { EMPTY, clubBySlug, db, expectRedirect, form, signInAs } from "./helpers";
import { callRoute, seedFleetOnce } from "./fleet-helpers";

const CLUB = "aeroclub-silberau";
const FIELDS = {
  club: CLUB, registration: "d-0slc", make: "Larkspur", model: "L-2 Trainer", typeGroup: "Larkspur L-2", category: "Airplane", classRating: "Single-engine land",
  hourlyRate: "139.50", rateMeter: "hobbs", maintenanceMeter: "tach", currentHobbs: "812.4", currentTach: "690.2", usedForInstruction: "on",
};

async function detail(aircraftId: string) {
  const { status, body } = await callRoute(aircraftDetailRoute, `/api/clubs/${CLUB}/aircraft/${aircraftId}`, { club: CLUB, aircraftId });
  expect(status).toBe(200);
  return body as FlightLineEntry & { today: string };
}

describe("aircraft records and inspection completions", () => {
  let aircraftId = "";
  beforeAll(async () => {
    await seedFleetOnce();
  });

  it("only maintenance or an admin adds an aircraft; bad input is refused field by field", async () => {
    signInAs("silberau.pilot@hangarline.test");
    expect((await createAircraft(EMPTY, form(FIELDS))).ok).toBe(false);
    signInAs("silberau.technik@hangarline.test");
    const bad = await createAircraft(EMPTY, form({ ...FIELDS, registration: "not a mark!", hourlyRate: "lots", currentHobbs: "" }));
    expect(bad.ok).toBe(false);
    expect(bad.fieldErrors.registration?.[0]).toMatch(/letters, digits and dashes/);
    expect(bad.fieldErrors.hourlyRate?.[0]).toMatch(/amount/);
    expect(bad.fieldErrors.currentHobbs?.[0]).toMatch(/current Hobbs/);
  });

  it("a new aircraft gets the default items and says 'Status unknown' until completions are recorded", async () => {
    signInAs("silberau.technik@hangarline.test");
    const to = await expectRedirect(() => createAircraft(EMPTY, form(FIELDS)));
    aircraftId = to.split("/").at(-1)!;
    const row = db().select().from(aircraft).where(eq(aircraft.id, aircraftId)).get()!;
    expect(row).toMatchObject({ registration: "D-0SLC", hourlyRateMinor: 13950, currentTach: 690.2 });
    const club = clubBySlug(CLUB);
    expect(listItems(db(), club.id, aircraftId).map((i) => i.key)).toEqual(["annual", "100-hour", "elt", "elt-battery", "transponder", "altimeter-static", "vor-check", "oil-change"]);
    const d = await detail(aircraftId);
    expect(d.status).toBe("unknown");
    // VFR aircraft: the IFR-only tests do not apply and are not listed (14 CFR 91.411, 91.171)
    expect(d.due.map((x) => x.key)).not.toContain("vor-check");
    expect(d.reasons.map((r) => r.code)).toContain("no-completion");
  });

  it("an hours-based item needs the meter reading; a fixed-date item needs its expiry", async () => {
    signInAs("silberau.technik@hangarline.test");
    const items = listItems(db(), clubBySlug(CLUB).id, aircraftId);
    const hundred = items.find((i) => i.key === "100-hour")!;
    const state = await recordCompletion(EMPTY, form({ club: CLUB, itemId: hundred.id, doneOn: "2026-11-20", hours: "", mechanicName: "Jannik Oberwald", mechanicCertificate: "Part-66 X0-66-0000-0417" }));
    expect(state.fieldErrors.hours?.[0]).toMatch(/tach reading/);
    const battery = items.find((i) => i.key === "elt-battery")!;
    const noExpiry = await recordCompletion(EMPTY, form({ club: CLUB, itemId: battery.id, doneOn: "2026-11-20", mechanicName: "Jannik Oberwald", mechanicCertificate: "Part-66 X0-66-0000-0417" }));
    expect(noExpiry.fieldErrors.expiresOn?.[0]).toMatch(/expires/);
    const noMechanic = await recordCompletion(EMPTY, form({ club: CLUB, itemId: battery.id, doneOn: "2026-11-20", expiresOn: "2029-11-30", mechanicName: "", mechanicCertificate: "" }));
    expect(noMechanic.fieldErrors.mechanicName?.[0]).toMatch(/mechanic's name/);
    expect(noMechanic.fieldErrors.mechanicCertificate?.[0]).toMatch(/certificate number/);
  });

  it("recording every completion with mechanic and certificate makes it flyable, with the due list computed", async () => {
    signInAs("silberau.technik@hangarline.test");
    const d0 = await detail(aircraftId);
    const today = d0.today;
    const items = listItems(db(), clubBySlug(CLUB).id, aircraftId);
    const values: Record<string, Record<string, string>> = {
      annual: { hours: "680.0" },
      "100-hour": { hours: "680.0" },
      elt: {},
      "elt-battery": { expiresOn: "2029-11-30" },
      transponder: {},
      "oil-change": { hours: "685.0" },
    };
    for (const item of items.filter((i) => values[i.key])) {
      const s = await recordCompletion(EMPTY, form({ club: CLUB, itemId: item.id, doneOn: today, mechanicName: "Jannik Oberwald", mechanicCertificate: "Part-66 X0-66-0000-0417", ...values[item.key] }));
      expect(s.ok, `${item.key}: ${s.message}`).toBe(true);
    }
    const d = await detail(aircraftId);
    expect(d.status).toBe("flyable");
    // 100-hour done at 680.0 → due at 780.0 (14 CFR 91.409(b)); tach 690.2 → 89.8 h left (arithmetic)
    expect(d.due.find((x) => x.key === "100-hour")).toMatchObject({ dueHours: 780, hoursLeft: 89.8 });
    const audits = db().select().from(auditLog).where(eq(auditLog.action, "inspection.record")).all();
    expect(audits.length).toBeGreaterThanOrEqual(6);
  });

  it("a recurring directive added by maintenance weighs on the status until it is recorded; it can be retired, never deleted", async () => {
    signInAs("silberau.technik@hangarline.test");
    const noMonths = await createInspectionItem(EMPTY, form({ club: CLUB, aircraftId, name: "AD X0-0001 seat rail check", origin: "directive", ruleKind: "calendar-months", required: "on" }));
    expect(noMonths.fieldErrors.months?.[0]).toMatch(/calendar months/);
    const ok = await createInspectionItem(EMPTY, form({ club: CLUB, aircraftId, name: "AD X0-0001 seat rail check", origin: "directive", ruleKind: "calendar-months", months: "12", required: "on", source: "AD X0-0001 (invented)" }));
    expect(ok.ok).toBe(true);
    expect((await detail(aircraftId)).status).toBe("unknown");
    const item = db().select().from(inspectionItems).where(and(eq(inspectionItems.aircraftId, aircraftId), eq(inspectionItems.key, "ad-ad-x0-0001-seat-rail-check"))).get()!;
    const retired = await updateInspectionItem(EMPTY, form({ club: CLUB, itemId: item.id, retire: "on", note: "Superseded" }));
    expect(retired.ok).toBe(true);
    expect((await detail(aircraftId)).status).toBe("flyable");
    expect(db().select().from(inspectionItems).where(eq(inspectionItems.id, item.id)).get()!.retiredAt).toBeInstanceOf(Date);
    const annual = listItems(db(), clubBySlug(CLUB).id, aircraftId).find((i) => i.key === "annual")!;
    const refuse = await updateInspectionItem(EMPTY, form({ club: CLUB, itemId: annual.id, retire: "on" }));
    expect(refuse.fieldErrors.retire?.[0]).toMatch(/Regulation items stay/);
  });

  it("ELT use over one cumulative hour grounds it (14 CFR 91.207(c))", async () => {
    signInAs("silberau.technik@hangarline.test");
    const battery = listItems(db(), clubBySlug(CLUB).id, aircraftId).find((i) => i.key === "elt-battery")!;
    expect((await updateInspectionItem(EMPTY, form({ club: CLUB, itemId: battery.id, usageUsedHours: "1.2" }))).ok).toBe(true);
    const d = await detail(aircraftId);
    expect(d.status).toBe("grounded"); // more than 1 cumulative hour, 14 CFR 91.207(c)(1)
    expect((await updateInspectionItem(EMPTY, form({ club: CLUB, itemId: battery.id, usageUsedHours: "0.4" }))).ok).toBe(true);
    expect((await detail(aircraftId)).status).toBe("flyable");
  });

  it("an admin corrects the record; the audit log keeps before and after", async () => {
    signInAs("silberau.admin@hangarline.test");
    const state = await updateAircraft(EMPTY, form({ ...FIELDS, aircraftId, registration: "D-0SLC", hourlyRate: "145", currentHobbs: "812.4", currentTach: "690.2" }));
    expect(state.ok).toBe(true);
    const entry = db().select().from(auditLog).where(and(eq(auditLog.action, "aircraft.update"), eq(auditLog.subjectId, aircraftId))).get()!;
    expect(entry.before).toMatchObject({ hourlyRateMinor: 13950 });
    expect(entry.after).toMatchObject({ hourlyRateMinor: 14500 });
  });
});
