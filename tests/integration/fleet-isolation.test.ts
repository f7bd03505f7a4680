import { beforeAll, describe, expect, it } from "vitest";
import { GET as aircraftDetailRoute } from "@/app/api/clubs/[club]/aircraft/[aircraftId]/route";
import { GET as aircraftListRoute } from "@/app/api/clubs/[club]/aircraft/route";
import { GET as flightLineRoute } from "@/app/api/clubs/[club]/flight-line/route";
import { GET as flightsRoute } from "@/app/api/clubs/[club]/flights/route";
import { GET as squawkRoute } from "@/app/api/clubs/[club]/squawks/[squawkId]/route";
import { GET as squawksRoute } from "@/app/api/clubs/[club]/squawks/route";
import AircraftPage from "@/app/clubs/[club]/aircraft/[aircraftId]/page";
import FlightsPage from "@/app/clubs/[club]/flights/page";
import MaintenancePage from "@/app/clubs/[club]/maintenance/page";
import { getAircraft } from "@/db/queries/fleet";
import { getAircraftStatusEntry } from "@/db/queries/fleet-status";
import { getSquawk } from "@/db/queries/fleet-squawks";
import { squawks } from "@/db/schema";
import { issueGroundingNotice } from "@/lib/actions/fleet/issue-grounding-notice";
import { logFlight } from "@/lib/actions/fleet/log-flight";
import { reportSquawk } from "@/lib/actions/fleet/report-squawk";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { callRoute, planeByRegistration, seedFleetOnce } from "./fleet-helpers";
import { eq } from "drizzle-orm";

// Another club's aircraft (and its squawks) is answered exactly like one that does not exist.
describe("fleet tenant isolation", () => {
  let foreignAircraft = "";
  let foreignSquawk = "";
  beforeAll(async () => {
    await seedFleetOnce();
    foreignAircraft = planeByRegistration("cottonwood-flyers", "N0471C").id;
    foreignSquawk = db().select().from(squawks).where(eq(squawks.aircraftId, foreignAircraft)).get()!.id;
    signInAs("maintenance@hangarline.test"); // member and maintenance of Reedwater only
  });

  it("route handlers: 404 through the own club's URL for another club's ids", async () => {
    const L = "reedwater";
    expect((await callRoute(aircraftDetailRoute, `/api/clubs/${L}/aircraft/${foreignAircraft}`, { club: L, aircraftId: foreignAircraft })).status).toBe(404);
    expect((await callRoute(squawksRoute, `/api/clubs/${L}/squawks?aircraftId=${foreignAircraft}`, { club: L })).status).toBe(404);
    expect((await callRoute(squawkRoute, `/api/clubs/${L}/squawks/${foreignSquawk}`, { club: L, squawkId: foreignSquawk })).status).toBe(404);
    expect((await callRoute(flightsRoute, `/api/clubs/${L}/flights?aircraftId=${foreignAircraft}`, { club: L })).status).toBe(404);
    expect((await callRoute(aircraftDetailRoute, `/api/clubs/${L}/aircraft/no-such-id`, { club: L, aircraftId: "no-such-id" })).status).toBe(404);
  });

  it("route handlers: 404 through the other club's URL, where the person has no membership", async () => {
    const C = "cottonwood-flyers";
    for (const [route, url, params] of [
      [flightLineRoute, `/api/clubs/${C}/flight-line`, { club: C }],
      [aircraftListRoute, `/api/clubs/${C}/aircraft`, { club: C }],
      [aircraftDetailRoute, `/api/clubs/${C}/aircraft/${foreignAircraft}`, { club: C, aircraftId: foreignAircraft }],
      [squawksRoute, `/api/clubs/${C}/squawks`, { club: C }],
      [squawkRoute, `/api/clubs/${C}/squawks/${foreignSquawk}`, { club: C, squawkId: foreignSquawk }],
      [flightsRoute, `/api/clubs/${C}/flights`, { club: C }],
    ] as const) {
      const res = await callRoute(route as never, url, params as never);
      expect(res.status, url).toBe(404);
    }
  });

  it("route handlers: 401 without a session", async () => {
    signInAs(null);
    expect((await callRoute(flightLineRoute, "/api/clubs/reedwater/flight-line", { club: "reedwater" })).status).toBe(401);
    signInAs("maintenance@hangarline.test");
  });

  it("page queries filter by club: another club's aircraft and squawk are not found", () => {
    const lake = clubBySlug("reedwater");
    expect(getAircraft(db(), lake.id, foreignAircraft)).toBeUndefined();
    expect(getAircraftStatusEntry(db(), lake, foreignAircraft)).toBeUndefined();
    expect(getSquawk(db(), lake.id, foreignSquawk)).toBeUndefined();
  });

  it("pages render the not-found page for another club's aircraft", async () => {
    await expect(AircraftPage({ params: Promise.resolve({ club: "reedwater", aircraftId: foreignAircraft }) })).rejects.toThrow("not found");
    await expect(FlightsPage({ params: Promise.resolve({ club: "reedwater" }), searchParams: Promise.resolve({ aircraft: foreignAircraft }) })).rejects.toThrow("not found");
    // and the own club's aircraft page renders
    const own = planeByRegistration("reedwater", "N0512L");
    await expect(AircraftPage({ params: Promise.resolve({ club: "reedwater", aircraftId: own.id }) })).resolves.toBeTruthy();
    signInAs("member@hangarline.test");
    await expect(MaintenancePage({ params: Promise.resolve({ club: "reedwater" }) })).rejects.toThrow("not found"); // a plain member has no work queue
    signInAs("maintenance@hangarline.test");
  });

  it("actions refuse another club's aircraft and write nothing", async () => {
    const before = db().select().from(squawks).all().length;
    const squawk = await reportSquawk(EMPTY, form({ club: "reedwater", aircraftId: foreignAircraft, description: "Should not land anywhere", foundDuring: "preflight" }));
    expect(squawk.message).toMatch(/not found/);
    const notice = await issueGroundingNotice(EMPTY, form({ club: "reedwater", aircraftId: foreignAircraft, category: "safety", reason: "Not my club's aircraft" }));
    expect(notice.message).toMatch(/not found/);
    const flight = await logFlight(EMPTY, form({ club: "reedwater", aircraftId: foreignAircraft, flownOn: "2026-01-01", hobbsOut: "1", hobbsIn: "2", tachOut: "1", tachIn: "2" }));
    expect(flight.message).toMatch(/not found/);
    expect(db().select().from(squawks).all().length).toBe(before);
  });
});
