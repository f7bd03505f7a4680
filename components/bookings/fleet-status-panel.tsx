import type { Db } from "@/db/client";
import type { Club } from "@/db/schema";
import { getFlightLine } from "@/db/queries/fleet-status";
import { FleetStatusList } from "./fleet-days";

/** The fleet's statuses beside the sheet; streamed in its own Suspense boundary (it is the slow part). */
export async function FleetStatusPanel({ db, club }: { db: Db; club: Club }) {
  await Promise.resolve();
  const line = getFlightLine(db, club);
  return <FleetStatusList aircraft={line.entries.map((e) => ({ id: e.aircraft.id, registration: e.aircraft.registration, status: e.status }))} />;
}
