// Shared by the fleet integration tests: the demo fleet on top of the demo people, route
// handler calls, and small upload fixtures made here (no binary files in the repository).
import { and, eq } from "drizzle-orm";
import { aircraft, clubs } from "@/db/schema";
import { seedFleet } from "@/db/seed/fleet";
import { db, seedOnce } from "./helpers";

let fleetSeeded = false;
export async function seedFleetOnce() {
  const foundation = await seedOnce();
  if (!fleetSeeded) {
    seedFleet(db(), foundation);
    fleetSeeded = true;
  }
  return foundation;
}

export function planeByRegistration(slug: string, registration: string) {
  const club = db().select().from(clubs).where(eq(clubs.slug, slug)).get()!;
  const row = db().select().from(aircraft).where(and(eq(aircraft.clubId, club.id), eq(aircraft.registration, registration))).get();
  if (!row) throw new Error(`No aircraft ${registration} in ${slug}`);
  return row;
}

/** Calls a route handler the way Next does: a Request and the params as a promise. */
export async function callRoute<P extends Record<string, string>>(
  handler: (req: Request, ctx: { params: Promise<P> }) => Promise<Response>,
  url: string,
  params: P,
): Promise<{ status: number; body: unknown }> {
  const res = await handler(new Request(`http://app.test${url}`), { params: Promise.resolve(params) });
  const type = res.headers.get("content-type") ?? "";
  return { status: res.status, body: type.includes("json") ? await res.json() : await res.arrayBuffer() };
}

// A 1×1 PNG (signature, IHDR, IDAT, IEND), built from its published byte layout.
const PNG_1PX = "iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAQAAAC1HAwCAAAAC0lEQVR42mNkYAAAAAYAAjCB0C8AAAAASUVORK5CYII=";

export function pngFile(name = "brake.png"): File {
  return new File([Buffer.from(PNG_1PX, "base64")], name, { type: "image/png" });
}

/** Text pretending to be a photo: the name and the browser's claim say PNG, the bytes do not. */
export function fakePngFile(): File {
  return new File([Buffer.from("this is not an image at all\n")], "photo.png", { type: "image/png" });
}

export function oversizeJpegFile(): File {
  const bytes = Buffer.alloc(10 * 1024 * 1024 + 1);
  bytes.set([0xff, 0xd8, 0xff, 0xe0]);
  return new File([bytes], "huge.jpg", { type: "image/jpeg" });
}
