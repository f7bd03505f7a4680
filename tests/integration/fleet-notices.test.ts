import { beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { GET as flightLineRoute } from "@/app/api/clubs/[club]/flight-line/route";
import { auditLog, emailOutbox, groundingNotices, memberships } from "@/db/schema";
import { renderEmail } from "@/emails";
import { issueGroundingNotice } from "@/lib/actions/fleet/issue-grounding-notice";
import { liftGroundingNotice } from "@/lib/actions/fleet/lift-grounding-notice";
import type { FlightLineEntry } from "@/lib/fleet/types";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { callRoute, planeByRegistration, seedFleetOnce } from "./fleet-helpers";

const CLUB = "reedwater";

async function statusOf(registration: string): Promise<FlightLineEntry> {
  const { body } = await callRoute(flightLineRoute, `/api/clubs/${CLUB}/flight-line`, { club: CLUB });
  return (body as { entries: FlightLineEntry[] }).entries.find((e) => e.aircraft.registration === registration)!;
}

describe("grounding notices", () => {
  let noticeId = "";
  beforeAll(async () => {
    await seedFleetOnce();
  });

  it("a member cannot issue one", async () => {
    signInAs("member@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0549L");
    const state = await issueGroundingNotice(EMPTY, form({ club: CLUB, aircraftId: plane.id, category: "safety", reason: "Looks unsafe to me" }));
    expect(state.ok).toBe(false);
    expect(state.message).toMatch(/safety officer or maintenance officer/i);
    expect(db().select().from(groundingNotices).all()).toHaveLength(0);
  });

  it("the safety officer grounds an aircraft: one outbox row per active member, and the flight line says grounded", async () => {
    const officer = signInAs("safety@hangarline.test")!;
    const plane = planeByRegistration(CLUB, "N0549L");
    const club = clubBySlug(CLUB);
    const outboxBefore = db().select().from(emailOutbox).where(eq(emailOutbox.template, "grounding-notice")).all().length;
    const state = await issueGroundingNotice(EMPTY, form({ club: CLUB, aircraftId: plane.id, category: "maintenance", reason: "Bird strike on the left wing reported by a visitor" }));
    expect(state).toMatchObject({ ok: true });
    noticeId = (state.data as { noticeId: string }).noticeId;

    const active = db().select().from(memberships).where(and(eq(memberships.clubId, club.id), eq(memberships.status, "active"))).all();
    const rows = db().select().from(emailOutbox).where(and(eq(emailOutbox.template, "grounding-notice"), eq(emailOutbox.clubId, club.id))).all();
    expect(rows.length - outboxBefore).toBe(active.length);
    expect(new Set(rows.map((r) => r.toAddress)).size).toBe(active.length);
    expect(rows.map((r) => r.toAddress)).toContain("member@hangarline.test");
    expect(rows[0]!.subject).toBe("N0549L grounded: Bird strike on the left wing reported by a visitor");
    const rendered = await renderEmail("grounding-notice", rows[0]!.payload as never);
    expect(rendered.text).toMatch(/N0549L \(Brightwing BW-4 Tourer IFR\) is grounded from/);

    const entry = await statusOf("N0549L");
    expect(entry.status).toBe("grounded");
    expect(entry.reasons[0]!.code).toBe("notice-active");
    expect(entry.reasons[0]!.text).toMatch(/Bird strike on the left wing/);
    const audit = db().select().from(auditLog).where(and(eq(auditLog.action, "grounding.issue"), eq(auditLog.subjectId, noticeId))).get();
    expect(audit?.actorId).toBe(officer.id);
  });

  it("lifting a maintenance notice needs a note and the return-to-service entry", async () => {
    signInAs("mechanic@hangarline.test");
    const bare = await liftGroundingNotice(EMPTY, form({ club: CLUB, noticeId, liftNote: "" }));
    expect(bare.ok).toBe(false);
    expect(bare.fieldErrors.liftNote?.[0]).toMatch(/why it is lifted/);
    const noRts = await liftGroundingNotice(EMPTY, form({ club: CLUB, noticeId, liftNote: "Wing inspected, no damage found" }));
    expect(noRts.ok).toBe(false);
    expect(Object.keys(noRts.fieldErrors).sort()).toEqual(["liftCertificate", "liftMechanicName"]);
    expect((await statusOf("N0549L")).status).toBe("grounded");

    const lifted = await liftGroundingNotice(EMPTY, form({ club: CLUB, noticeId, liftNote: "Wing inspected, no damage found", liftMechanicName: "Hollis Fairbank", liftCertificate: "A&P 0003902 IA" }));
    expect(lifted.ok).toBe(true);
    expect((await statusOf("N0549L")).status).not.toBe("grounded");
    const again = await liftGroundingNotice(EMPTY, form({ club: CLUB, noticeId, liftNote: "twice", liftMechanicName: "x", liftCertificate: "y" }));
    expect(again.ok).toBe(false);
    expect(again.message).toMatch(/already lifted/);
  });

  it("a notice that takes effect later does not ground yet, and says when it will", async () => {
    signInAs("maintenance@hangarline.test");
    const plane = planeByRegistration(CLUB, "N0534L");
    const state = await issueGroundingNotice(EMPTY, form({ club: CLUB, aircraftId: plane.id, category: "safety", reason: "Ramp closed for resurfacing", effectiveAt: "2199-06-01T08:00" }));
    expect(state.ok).toBe(true);
    const entry = await statusOf("N0534L");
    expect(entry.status).not.toBe("grounded");
    // Said on the club's clock (America/Chicago) as typed, never as the UTC instant 2199-06-01T13:00:00.000Z
    // (ECMA-402 Intl.DateTimeFormat; 1 June 2199 is a Saturday, proleptic Gregorian calendar).
    expect(entry.reasons.find((r) => r.code === "notice-pending")?.text).toBe("Grounding notice takes effect Sat 1 Jun 2199, 08:00: Ramp closed for resurfacing");
  });
});
