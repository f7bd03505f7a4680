import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { auditLog, clubs } from "@/db/schema";
import { updateFlyingDay } from "@/lib/actions/clubs/update-flying-day";
import { EMPTY, clubBySlug, db, form, seedOnce, signInAs } from "./helpers";

describe("the club's flying day", () => {
  beforeAll(async () => {
    await seedOnce();
  });

  it("refuses a time that is not HH:MM and a day that opens and closes at once, writing nothing", async () => {
    signInAs("admin@hangarline.test");
    const before = clubBySlug("reedwater").settings;
    const bad = await updateFlyingDay(EMPTY, form({ club: "reedwater", flyingDayOpens: "7am", flyingDayCloses: "25:00" }));
    expect(bad.ok).toBe(false);
    expect(bad.fieldErrors.flyingDayOpens?.[0]).toMatch(/HH:MM on the 24-hour clock/);
    expect(bad.fieldErrors.flyingDayCloses?.[0]).toMatch(/HH:MM on the 24-hour clock/);
    const same = await updateFlyingDay(EMPTY, form({ club: "reedwater", flyingDayOpens: "08:00", flyingDayCloses: "08:00" }));
    expect(same.ok).toBe(false);
    expect(same.fieldErrors.flyingDayCloses?.[0]).toBe("The flying day cannot open and close at the same time.");
    expect(clubBySlug("reedwater").settings).toEqual(before);
  });

  it("is saved by the admin, audited, and kept beside the other settings", async () => {
    signInAs("admin@hangarline.test");
    const before = clubBySlug("reedwater").settings;
    const ok = await updateFlyingDay(EMPTY, form({ club: "reedwater", flyingDayOpens: "06:30", flyingDayCloses: "22:15" }));
    expect(ok.ok).toBe(true);
    expect(ok.message).toBe("Flying day saved: from 06:30 to 22:15 club time. The booking page lists free time inside it.");
    const club = clubBySlug("reedwater");
    expect(club.settings).toEqual({ ...before, flyingDayOpens: "06:30", flyingDayCloses: "22:15" });
    const audit = db().select().from(auditLog).where(eq(auditLog.clubId, club.id)).all().filter((a) => a.action === "club.settings.update");
    expect(audit.at(-1)?.after).toEqual({ flyingDayOpens: "06:30", flyingDayCloses: "22:15" });
    const overnight = await updateFlyingDay(EMPTY, form({ club: "reedwater", flyingDayOpens: "18:00", flyingDayCloses: "02:00" }));
    expect(overnight.message).toContain("(it closes after midnight)");
    db().update(clubs).set({ settings: before }).where(eq(clubs.id, club.id)).run();
  });

  it("is refused to a member who is not an admin", async () => {
    signInAs("silberau.pilot@hangarline.test");
    const refused = await updateFlyingDay(EMPTY, form({ club: "aeroclub-silberau", flyingDayOpens: "05:00", flyingDayCloses: "23:00" }));
    expect(refused.ok).toBe(false);
    expect(clubBySlug("aeroclub-silberau").settings.flyingDayOpens).not.toBe("05:00");
  });
});
