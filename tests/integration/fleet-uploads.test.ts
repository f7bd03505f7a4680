import fs from "node:fs";
import { beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { GET as uploadRoute } from "@/app/api/clubs/[club]/uploads/[uploadId]/route";
import { inspectionCompletions, squawks, uploads } from "@/db/schema";
import { recordCompletion } from "@/lib/actions/fleet/record-completion";
import { reportSquawk } from "@/lib/actions/fleet/report-squawk";
import { listItems } from "@/db/queries/fleet";
import { uploadDir } from "@/lib/storage";
import { EMPTY, clubBySlug, db, squawkIdOf, form, signInAs } from "./helpers";
import { callRoute, fakePngFile, oversizeJpegFile, planeByRegistration, pngFile, seedFleetOnce } from "./fleet-helpers";

const CLUB = "reedwater";

function filesOnDisk(): string[] {
  return fs.existsSync(uploadDir()) ? fs.readdirSync(uploadDir()) : [];
}

describe("fleet uploads: photos and work orders", () => {
  beforeAll(async () => {
    await seedFleetOnce();
  });

  it("stores a squawk photo checked by its content, served only through the checked route", async () => {
    signInAs("member@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0534L");
    const squawkId = await squawkIdOf(() => reportSquawk(EMPTY, form({ club: CLUB, aircraftId: plane.id, description: "Cracked wheel fairing, left main", foundDuring: "preflight", photos: pngFile() })));
    const [row] = db().select().from(uploads).where(and(eq(uploads.subjectType, "Squawk"), eq(uploads.subjectId, squawkId))).all();
    expect(row).toMatchObject({ mimeType: "image/png", originalName: "brake.png" });
    expect(filesOnDisk()).toContain(row!.storageKey);
    const served = await callRoute(uploadRoute, `/api/clubs/${CLUB}/uploads/${row!.id}`, { club: CLUB, uploadId: row!.id });
    expect(served.status).toBe(200);
    // A member of another club gets the same answer as for a file that does not exist.
    signInAs("cottonwood.pilot@hangarline.test");
    const elsewhere = await callRoute(uploadRoute, `/api/clubs/cottonwood-flyers/uploads/${row!.id}`, { club: "cottonwood-flyers", uploadId: row!.id });
    expect(elsewhere.status).toBe(404);
  });

  it("refuses a file that is not an image (by content, whatever its name): no squawk, no row, no file", async () => {
    signInAs("member@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0534L");
    const before = { squawks: db().select().from(squawks).all().length, uploads: db().select().from(uploads).all().length, files: filesOnDisk().length };
    const state = await reportSquawk(EMPTY, form({ club: CLUB, aircraftId: plane.id, description: "Dent in the leading edge", foundDuring: "preflight", photos: fakePngFile() }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.photos?.[0]).toBe('"photo.png" is not a JPG, PNG, WEBP, HEIC file (checked by its content, not its name).');
    expect({ squawks: db().select().from(squawks).all().length, uploads: db().select().from(uploads).all().length, files: filesOnDisk().length }).toEqual(before);
  });

  it("refuses a file over the size limit with a clear message and stores nothing", async () => {
    signInAs("member@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0534L");
    const before = { uploads: db().select().from(uploads).all().length, files: filesOnDisk().length };
    const fd = form({ club: CLUB, aircraftId: plane.id, description: "Big photo of a small scratch", foundDuring: "preflight" });
    fd.append("photos", pngFile("ok.png"));
    fd.append("photos", oversizeJpegFile());
    const state = await reportSquawk(EMPTY, fd);
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.photos?.[0]).toBe('"huge.jpg" is 10.0 MB; the limit is 10 MB.');
    expect({ uploads: db().select().from(uploads).all().length, files: filesOnDisk().length }).toEqual(before);
  });

  it("a completion keeps its work order (PDF), and a completion refused for bad data leaves no file behind", async () => {
    signInAs("mechanic@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0534L");
    const club = clubBySlug(CLUB);
    const annual = listItems(db(), club.id, plane.id).find((i) => i.key === "annual")!;
    const pdf = new File([Buffer.from("%PDF-1.4\n% invented work order\n")], "work-order.pdf", { type: "application/pdf" });
    const filesBefore = filesOnDisk().length;
    // In the future: refused inside the transaction, after the bytes were written; they must go.
    const refused = await recordCompletion(EMPTY, form({ club: CLUB, itemId: annual.id, doneOn: "2199-01-01", mechanicName: "Hollis Fairbank", mechanicCertificate: "A&P 0003902 IA", document: pdf }));
    expect(refused.ok).toBe(false);
    expect(refused.fieldErrors.doneOn?.[0]).toMatch(/future/);
    expect(filesOnDisk().length).toBe(filesBefore);

    const ok = await recordCompletion(EMPTY, form({ club: CLUB, itemId: annual.id, doneOn: "2026-01-10", mechanicName: "Hollis Fairbank", mechanicCertificate: "A&P 0003902 IA", document: pdf }));
    expect(ok).toMatchObject({ ok: true });
    const completion = db().select().from(inspectionCompletions).where(and(eq(inspectionCompletions.itemId, annual.id), eq(inspectionCompletions.doneOn, "2026-01-10"))).get()!;
    const file = db().select().from(uploads).where(and(eq(uploads.subjectType, "InspectionCompletion"), eq(uploads.subjectId, completion.id))).get();
    expect(file).toMatchObject({ mimeType: "application/pdf", originalName: "work-order.pdf" });
    expect(filesOnDisk().length).toBe(filesBefore + 1);
  });
});
