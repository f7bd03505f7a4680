import fs from "node:fs";
import path from "node:path";
import sharp from "sharp";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as uploadRoute } from "@/app/api/clubs/[club]/uploads/[uploadId]/route";
import { memberDocuments, uploads } from "@/db/schema";
import { recordDocument } from "@/lib/actions/documents/record-document";
import { reportSquawk } from "@/lib/actions/fleet/report-squawk";
import { uploadDir } from "@/lib/storage";
import { EMPTY, db, squawkIdOf, form, signInAs } from "./helpers";
import { planeByRegistration, seedFleetOnce } from "./fleet-helpers";

const CLUB = "reedwater";

async function serve(uploadId: string) {
  return uploadRoute(new Request(`http://app.test/api/clubs/${CLUB}/uploads/${uploadId}`), { params: Promise.resolve({ club: CLUB, uploadId }) });
}

/** Does this EXIF block (TIFF layout) point to a GPS directory? Tag 0x8825, in either byte order. */
function hasGpsPointer(exif: Buffer): boolean {
  return exif.includes(Buffer.from([0x25, 0x88])) || exif.includes(Buffer.from([0x88, 0x25]));
}

/** A phone-style photo: 80×40 pixels stored sideways (orientation 6 = rotate 90°) with a GPS position. */
async function photoWithLocation(): Promise<Buffer> {
  return sharp({ create: { width: 80, height: 40, channels: 3, background: { r: 200, g: 40, b: 40 } } })
    .jpeg()
    .withMetadata({ orientation: 6 })
    .withExif({ IFD0: { Make: "Invented Camera Co", Model: "Model 1" }, IFD3: { GPSLatitudeRef: "N", GPSLatitude: "45/1 30/1 0/1", GPSLongitudeRef: "W", GPSLongitude: "93/1 15/1 0/1" } })
    .toBuffer();
}

function filesOnDisk(): string[] {
  return fs.existsSync(uploadDir()) ? fs.readdirSync(uploadDir()) : [];
}

describe("uploads: cleaned on the way in, served safely", () => {
  beforeAll(async () => {
    await seedFleetOnce();
  });

  it("stores a photo re-encoded without its EXIF block (no GPS), turned upright first", async () => {
    const original = await photoWithLocation();
    const meta = await sharp(original).metadata();
    // The fixture really carries what a phone would: a location and a rotation tag.
    expect(meta.exif && hasGpsPointer(meta.exif)).toBe(true);
    expect(meta.orientation).toBe(6);

    signInAs("member@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0534L");
    const photo = new File([new Uint8Array(original)], "ramp.jpg", { type: "image/jpeg" });
    const squawkId = await squawkIdOf(() => reportSquawk(EMPTY, form({ club: CLUB, aircraftId: plane.id, description: "Chafed brake line, right main", foundDuring: "preflight", photos: photo })));
    const row = db().select().from(uploads).where(and(eq(uploads.subjectType, "Squawk"), eq(uploads.subjectId, squawkId))).get()!;

    const res = await serve(row.id);
    expect(res.status).toBe(200);
    const served = Buffer.from(await res.arrayBuffer());
    const servedMeta = await sharp(served).metadata();
    expect(servedMeta.format).toBe("jpeg");
    expect(servedMeta.exif).toBeUndefined();
    expect(servedMeta.orientation).toBeUndefined();
    // Rotated into the pixels: the sideways 80×40 frame is now 40×80.
    expect({ width: servedMeta.width, height: servedMeta.height }).toEqual({ width: 40, height: 80 });
    expect(served.includes(Buffer.from("Invented Camera Co"))).toBe(false);
    // What is on disk is what is served, and the row describes it.
    expect(row.sizeBytes).toBe(served.length);
    // A photo of the aircraft is for the whole club: shown inline, cached privately for a short while.
    expect(res.headers.get("content-disposition")).toMatch(/^inline;/);
    expect(res.headers.get("cache-control")).toBe("private, max-age=300");
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("content-security-policy")).toBe("sandbox");
  });

  it("serves a member's PDF only as a download, sandboxed, never cached", async () => {
    signInAs("member@hangarline.test");
    const pdf = new File([Buffer.from("%PDF-1.4\n% invented renter's insurance policy\n")], "insurance.pdf", { type: "application/pdf" });
    const state = await recordDocument(EMPTY, form({ club: CLUB, kind: "renters_insurance", issuedOn: "2026-01-05", expiresOn: "2027-01-05", file: pdf }));
    expect(state).toMatchObject({ ok: true });
    const doc = db().select().from(memberDocuments).where(eq(memberDocuments.id, (state.data as { documentId: string }).documentId)).get()!;
    const res = await serve(doc.uploadId!);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toBe('attachment; filename="insurance.pdf"');
    expect(res.headers.get("content-security-policy")).toBe("sandbox");
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("cache-control")).toBe("no-store");
    expect(Buffer.from(await res.arrayBuffer()).toString()).toContain("invented renter's insurance policy");
  });

  it("answers 404, not a failure, when a stored file is missing from the disk", async () => {
    signInAs("member@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0534L");
    const photo = new File([new Uint8Array(await photoWithLocation())], "gone.jpg", { type: "image/jpeg" });
    const squawkId = await squawkIdOf(() => reportSquawk(EMPTY, form({ club: CLUB, aircraftId: plane.id, description: "Loose fairing screw, nose gear", foundDuring: "preflight", photos: photo })));
    const row = db().select().from(uploads).where(and(eq(uploads.subjectType, "Squawk"), eq(uploads.subjectId, squawkId))).get()!;
    fs.rmSync(path.join(uploadDir(), row.storageKey));
    const res = await serve(row.id);
    expect(res.status).toBe(404);
    expect(await res.json()).toEqual({ error: { code: "not_found", message: "Not found." } });
  });

  it("refuses a HEIC photo it cannot clean, with a clear message, and stores nothing", async () => {
    signInAs("member@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0534L");
    // The start of a HEIC file (an ISO "ftyp" box with the "heic" brand); this machine's image library has no HEIC decoder.
    const heic = new File([Buffer.from("000000186674797068656963000000006d69663168656963", "hex")], "IMG_0001.heic", { type: "image/heic" });
    const before = { rows: db().select().from(uploads).all().length, files: filesOnDisk().length };
    const state = await reportSquawk(EMPTY, form({ club: CLUB, aircraftId: plane.id, description: "Oil streak behind the cowling", foundDuring: "postflight", photos: heic }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.photos?.[0]).toBe('"IMG_0001.heic" is a HEIC photo, which cannot be cleaned of its location data here; save or share it as a JPEG and upload that.');
    expect({ rows: db().select().from(uploads).all().length, files: filesOnDisk().length }).toEqual(before);
  });

  it("refuses a damaged image (right first bytes, no picture) and stores nothing", async () => {
    signInAs("member@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0534L");
    const broken = new File([Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(64, 1)])], "broken.jpg", { type: "image/jpeg" });
    const before = { rows: db().select().from(uploads).all().length, files: filesOnDisk().length };
    const state = await reportSquawk(EMPTY, form({ club: CLUB, aircraftId: plane.id, description: "Cracked lens on the landing light", foundDuring: "preflight", photos: broken }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.photos?.[0]).toMatch(/^"broken\.jpg" could not be read as an image/);
    expect({ rows: db().select().from(uploads).all().length, files: filesOnDisk().length }).toEqual(before);
  });
});
