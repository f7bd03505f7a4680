import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { auditLog, clubs } from "@/db/schema";
import { statementFor } from "@/db/queries/money-statements";
import { updateClubLocale } from "@/lib/actions/clubs/update-club-locale";
import { renderStatementPdf } from "@/lib/money/statement-pdf";
import { EMPTY, clubBySlug, db, form, seedOnce, signInAs } from "./helpers";

describe("the club's locale", () => {
  beforeAll(async () => {
    await seedOnce();
  });

  it("starts the euro club in de-DE and the US clubs in en-US", () => {
    expect(clubBySlug("aeroclub-silberau").locale).toBe("de-DE"); // from EUR + Europe/Berlin (common practice)
    expect(clubBySlug("reedwater").locale).toBe("en-US"); // from USD (common practice)
  });

  it("is changed by the admin, audited, and refused for a tag it does not offer", async () => {
    signInAs("admin@hangarline.test");
    const bad = await updateClubLocale(EMPTY, form({ club: "reedwater", locale: "xx-YY" }));
    expect(bad.ok).toBe(false);
    expect(bad.fieldErrors.locale?.[0]).toMatch(/Choose one of the listed locales/);
    expect(clubBySlug("reedwater").locale).toBe("en-US");

    const ok = await updateClubLocale(EMPTY, form({ club: "reedwater", locale: "en-CA" }));
    expect(ok.ok).toBe(true);
    expect(ok.message).toContain("$2,893.06"); // ECMA-402 Intl.NumberFormat, CLDR en-CA
    const club = clubBySlug("reedwater");
    expect(club.locale).toBe("en-CA");
    const audit = db().select().from(auditLog).where(eq(auditLog.clubId, club.id)).all().filter((a) => a.action === "club.settings.update");
    expect(audit.at(-1)?.after).toEqual({ locale: "en-CA" });
    db().update(clubs).set({ locale: "en-US" }).where(eq(clubs.id, club.id)).run();
  });

  it("is refused to a member who is not an admin", async () => {
    signInAs("silberau.pilot@hangarline.test");
    const refused = await updateClubLocale(EMPTY, form({ club: "aeroclub-silberau", locale: "en-US" }));
    expect(refused.ok).toBe(false);
    expect(clubBySlug("aeroclub-silberau").locale).toBe("de-DE");
  });

  it("prints the euro club's statement on A4 with its own amounts", async () => {
    const club = clubBySlug("aeroclub-silberau");
    const figures = statementFor(db(), club.id, signInAs("silberau.pilot@hangarline.test")!.id, "2026-11");
    const pdf = await renderStatementPdf({ clubName: club.name, memberName: "x", memberEmail: "x@example.test", periodLabel: "x", currency: club.currency, locale: club.locale, figures, balanceNowMinor: figures.balanceNowMinor, generatedOn: "2026-12-01" });
    expect(/\/MediaBox \[([^\]]+)\]/.exec(pdf.toString("latin1"))?.[1]?.trim()).toBe("0 0 595.28 841.89"); // ISO 216 A4
  });
});
