// A preflight finding marked "may affect airworthiness" sends the same "possibly unsafe" alert as
// a squawk report so marked (one code path, through the outbox); a finding without the mark sends
// none. Cottonwood keeps one maintenance person and the pilot holds the only booking on N0488C,
// so the marked finding queues exactly one e-mail.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { bookings, emailOutbox, squawks } from "@/db/schema";
import { DEMO_CLUBS } from "@/db/seed/scenario";
import { getPreflightTemplate } from "@/db/queries/tools-preflight";
import { recordPreflight } from "@/lib/actions/preflight/record-preflight";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { planeId, seedScenario } from "./bookings-helpers";

const SLUG = DEMO_CLUBS.find((c) => c.key === "cottonwood")!.slug;
const PILOT = "cottonwood.pilot@hangarline.test";

describe("preflight finding marked as possibly unsafe", () => {
  let bookingId = "";
  let aircraftId = "";

  beforeAll(async () => {
    await seedScenario();
    aircraftId = planeId(SLUG, "N0488C");
    const club = clubBySlug(SLUG);
    const row = db().select().from(bookings).where(and(eq(bookings.clubId, club.id), eq(bookings.aircraftId, aircraftId))).get();
    expect(row).toBeDefined();
    bookingId = row!.id;
  });

  function alerts() {
    return db().select().from(emailOutbox).where(and(eq(emailOutbox.clubId, clubBySlug(SLUG).id), eq(emailOutbox.template, "squawk-alert"))).all();
  }

  /** Every item as expected except the first engine-area item, which is a finding. */
  function withFinding(note: string, marked: boolean) {
    const template = getPreflightTemplate(db(), clubBySlug(SLUG).id, aircraftId)!;
    const fields: Record<string, string | string[]> = { club: SLUG, bookingId, oilQuantity: String(template.oilMinimum), sumpPoint: template.sumpPoints, fuelTank: template.fuelTanks.map((t) => t.name), fuelQuantity: template.fuelTanks.map((t) => String(t.capacity ?? 10)) };
    template.sumpPoints.forEach((_, i) => (fields[`sump.${i}`] = "clear"));
    for (const item of template.items) fields[`result.${item.id}`] = "ok";
    const item = template.items.find((i) => i.kind === "check")!;
    fields[`result.${item.id}`] = "finding";
    fields[`note.${item.id}`] = note;
    if (marked) fields[`grounding.${item.id}`] = "on";
    return { fields, item };
  }

  it("a finding without the mark becomes a squawk and e-mails nobody", async () => {
    signInAs(PILOT);
    const before = alerts().length;
    const { fields } = withFinding("Small scuff on the cowling paint", false);
    const state = await recordPreflight(EMPTY, form(fields));
    expect(state, state.message).toMatchObject({ ok: true });
    expect((state.data as { squawkIds: string[] }).squawkIds).toHaveLength(1);
    expect(state.message).not.toMatch(/e-mailed/);
    expect(alerts()).toHaveLength(before);
  });

  it("a finding marked as possibly affecting airworthiness queues exactly one alert naming the aircraft and the finding", async () => {
    signInAs(PILOT);
    const before = alerts().length;
    const { fields, item } = withFinding("Oil seeping from the crankcase breather", true);
    const state = await recordPreflight(EMPTY, form(fields));
    expect(state, state.message).toMatchObject({ ok: true });
    expect(state.message).toMatch(/Marked as possibly affecting airworthiness: maintenance \(1 person\) was e-mailed\.$/);
    const [squawkId] = (state.data as { squawkIds: string[] }).squawkIds;
    const squawk = db().select().from(squawks).where(eq(squawks.id, squawkId!)).get()!;
    expect(squawk).toMatchObject({ suspectedGrounding: true, foundDuring: "preflight" });

    const queued = alerts().slice(before);
    expect(queued).toHaveLength(1);
    const [mail] = queued;
    expect(mail!.toAddress).toBe("cottonwood.maint@hangarline.test");
    expect(mail!.subject).toContain("N0488C");
    expect(mail!.subject).toContain(item.label.slice(0, 20));
    expect(mail!.payload).toMatchObject({ registration: "N0488C", squawkId, foundDuring: "preflight", because: "maintenance" });
    expect(String(mail!.payload.description)).toContain("Oil seeping from the crankcase breather");
    expect(String(mail!.payload.description)).toContain(item.label);
  });
});
