import { beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { GET as flightsRoute } from "@/app/api/clubs/[club]/flights/route";
import { aircraft, flights, squawks } from "@/db/schema";
import { logFlight } from "@/lib/actions/fleet/log-flight";
import { reviewMeterFlag } from "@/lib/actions/fleet/review-meter-flag";
import { EMPTY, db, form, signInAs } from "./helpers";
import { callRoute, planeByRegistration, seedFleetOnce } from "./fleet-helpers";

const CLUB = "cottonwood-flyers";

function flightForm(aircraftId: string, m: { hobbsOut: string; hobbsIn: string; tachOut: string; tachIn: string }, extra: Record<string, string> = {}) {
  return form({ club: CLUB, aircraftId, flownOn: "2026-01-15", dayLandings: "2", nightFullStopLandings: "0", fuelAdded: "12.5", oilAdded: "0", ...m, ...extra });
}

describe("flight log and meter continuity", () => {
  beforeAll(async () => {
    await seedFleetOnce();
  });

  it("refuses Hobbs in less than Hobbs out, naming the field, and writes nothing", async () => {
    signInAs("cottonwood.pilot@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0471C");
    const before = db().select().from(flights).all().length;
    const state = await logFlight(EMPTY, flightForm(plane.id, { hobbsOut: "4120.4", hobbsIn: "4119.9", tachOut: "3488.1", tachIn: "3487.0" }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.hobbsIn).toEqual(["Hobbs in cannot be less than Hobbs out."]);
    expect(state.fieldErrors.tachIn).toEqual(["Tach in cannot be less than tach out."]);
    expect(db().select().from(flights).all().length).toBe(before);
    expect(planeByRegistration(CLUB, "N0471C").currentHobbs).toBe(4120.4);
  });

  it("accepts a continuous flight and moves the aircraft's meters in the same transaction", async () => {
    signInAs("cottonwood.pilot@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0471C");
    const state = await logFlight(EMPTY, flightForm(plane.id, { hobbsOut: "4120.4", hobbsIn: "4121.8", tachOut: "3488.1", tachIn: "3489.3" }, { squawk: "Left fuel gauge reads low" }));
    expect(state).toMatchObject({ ok: true, data: { continuity: "ok" } });
    const after = planeByRegistration(CLUB, "N0471C");
    expect([after.currentHobbs, after.currentTach]).toEqual([4121.8, 3489.3]);
    const flightId = (state.data as { flightId: string }).flightId;
    expect(db().select().from(squawks).where(eq(squawks.flightId, flightId)).get()).toMatchObject({ description: "Left fuel gauge reads low", triage: "untriaged", foundDuring: "flight" });
  });

  it("flags a gap with the previous flight instead of accepting it silently, and maintenance sees the stored flag", async () => {
    signInAs("cottonwood.pilot@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0471C");
    const readings = { hobbsOut: "4122.3", hobbsIn: "4123.5", tachOut: "3489.7", tachIn: "3490.7" };
    // Without an explanation the mismatch is refused, naming the readings, and nothing is written.
    const count = db().select().from(flights).all().length;
    const refused = await logFlight(EMPTY, flightForm(plane.id, readings));
    expect(refused.ok).toBe(false);
    expect(refused.fieldErrors.hobbsOut?.[0]).toMatch(/0\.5 h not logged/);
    expect(refused.fieldErrors.meterExplanation?.[0]).toMatch(/say why/);
    expect(db().select().from(flights).all().length).toBe(count);
    const state = await logFlight(EMPTY, flightForm(plane.id, readings, { meterExplanation: "Ground run after the mag check" }));
    expect(state.ok).toBe(true);
    expect(state.data).toMatchObject({ continuity: "gap" });
    expect(state.message).toMatch(/flagged for maintenance/);
    const flightId = (state.data as { flightId: string }).flightId;
    const row = db().select().from(flights).where(eq(flights.id, flightId)).get()!;
    expect(row.continuity).toBe("gap");
    expect(row.meterExplanation).toBe("Ground run after the mag check");
    // 4122.3 − 4121.8 = 0.5 h of Hobbs and 3489.7 − 3489.3 = 0.4 h of tach not logged (arithmetic)
    expect(row.continuityText).toBe(
      "Hobbs out 4122.3 is 0.5 h after the previous Hobbs in 4121.8: 0.5 h not logged; Tach out 3489.7 is 0.4 h after the previous Tach in 3489.3: 0.4 h not logged",
    );

    signInAs("cottonwood.maint@hangarline.test");
    const flagged = await callRoute(flightsRoute, `/api/clubs/${CLUB}/flights?flagged=1&aircraftId=${plane.id}`, { club: CLUB });
    expect(flagged.status).toBe(200);
    expect((flagged.body as { flights: { id: string; continuity: string }[] }).flights).toContainEqual(expect.objectContaining({ id: flightId, continuity: "gap" }));
    const reviewed = await reviewMeterFlag(EMPTY, form({ club: CLUB, flightId, note: "Ground run for a mag check, not logged" }));
    expect(reviewed.ok).toBe(true);
    expect(db().select().from(flights).where(eq(flights.id, flightId)).get()).toMatchObject({ continuity: "gap", continuityReviewNote: "Ground run for a mag check, not logged" });
  });

  it("flags an overlap (time logged twice), and a late entry is checked against the flight after it too", async () => {
    signInAs("cottonwood.pilot@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0471C");
    const overlap = await logFlight(EMPTY, flightForm(plane.id, { hobbsOut: "4123.0", hobbsIn: "4124.0", tachOut: "3490.2", tachIn: "3491.0" }, { meterExplanation: "Previous pilot's in reading misread" }));
    expect(overlap.data).toMatchObject({ continuity: "overlap" });
    // Meters never move backwards; this one ends later, so they follow it.
    expect(planeByRegistration(CLUB, "N0471C").currentHobbs).toBe(4124.0);
    const between = await logFlight(EMPTY, flightForm(plane.id, { hobbsOut: "4121.8", hobbsIn: "4122.0", tachOut: "3489.3", tachIn: "3489.5" }, { meterExplanation: "Entered late from the paper log" }));
    expect(between.data).toMatchObject({ continuity: "gap" });
    expect(between.message).toMatch(/Next flight: Hobbs out 4122\.3 is 0\.3 h after the previous Hobbs in 4122\.0/);
    expect(planeByRegistration(CLUB, "N0471C").currentHobbs).toBe(4124.0);
  });

  it("a member cannot review a meter flag", async () => {
    signInAs("cottonwood.pilot@hangarline.test");
    const flagged = db().select().from(flights).where(eq(flights.continuity, "overlap")).get()!;
    const state = await reviewMeterFlag(EMPTY, form({ club: CLUB, flightId: flagged.id, note: "looks fine to me" }));
    expect(state.ok).toBe(false);
    expect(db().select().from(flights).where(eq(flights.id, flagged.id)).get()!.continuityReviewedAt).toBeNull();
  });

  it("a member logs only their own flights", async () => {
    signInAs("cottonwood.pilot@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0488C");
    const other = db().select().from(aircraft).where(eq(aircraft.id, plane.id)).get()!;
    const state = await logFlight(EMPTY, flightForm(plane.id, { hobbsOut: String(other.currentHobbs), hobbsIn: String((other.currentHobbs ?? 0) + 1), tachOut: String(other.currentTach), tachIn: String((other.currentTach ?? 0) + 1) }, { pilotId: "someone-else" }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.pilotId?.[0]).toMatch(/Only instructors and maintenance/);
  });
});
