import { beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { auditLog, clubs, invitations, operatorAssignments } from "@/db/schema";
import { createClub } from "@/lib/actions/operator/create-club";
import { assignClubAdmin } from "@/lib/actions/operator/assign-admin";
import { listOperatorClubSummaries } from "@/db/queries/operator";
import { EMPTY, clubBySlug, db, form, membershipOf, outboxFor, seedOnce, signInAs } from "./helpers";

const newClub = { name: "Juniper Ridge Flyers", slug: "juniper-ridge", timeZone: "America/Denver", currency: "USD", unitSystem: "imperial" };

describe("operator console", () => {
  beforeAll(async () => {
    await seedOnce();
  });

  it("summarises each club with counts and totals only, no member-level detail", () => {
    const operator = signInAs("operator@hangarline.test")!;
    const summaries = listOperatorClubSummaries(db(), operator.id);
    expect(summaries.map((s) => s.slug).sort()).toEqual(["aeroclub-silberau", "cottonwood-flyers", "lakeshore-aero"]);
    for (const s of summaries) {
      expect(Object.keys(s.fleet).sort()).toEqual(["flyable", "grounded", "limited", "unknown"]);
      expect(Number.isInteger(s.receivables.totalMinor)).toBe(true);
    }
    const text = JSON.stringify(summaries);
    expect(text).not.toMatch(/@hangarline\.test|Rowan|Pike/);
  });

  it("an operator creates a club and its first admin is invited through the outbox", async () => {
    const operator = signInAs("operator@hangarline.test")!;
    const state = await createClub(EMPTY, form({ ...newClub, adminEmail: "chief@juniper.test" }));
    expect(state).toMatchObject({ ok: true, data: { slug: "juniper-ridge" } });
    const club = clubBySlug("juniper-ridge");
    expect(club).toMatchObject({ timeZone: "America/Denver", currency: "USD", unitSystem: "imperial" });
    expect(club.settings.bookingGuards.grounded).toBe("refuse");
    expect(db().select().from(operatorAssignments).where(and(eq(operatorAssignments.clubId, club.id), eq(operatorAssignments.userId, operator.id))).all()).toHaveLength(1);
    const inv = db().select().from(invitations).where(eq(invitations.clubId, club.id)).get()!;
    expect(inv).toMatchObject({ email: "chief@juniper.test", roles: ["member", "admin"] });
    expect(outboxFor("chief@juniper.test")).toHaveLength(1);
    expect(db().select().from(auditLog).where(and(eq(auditLog.clubId, club.id), eq(auditLog.action, "club.create"))).all()).toHaveLength(1);
  });

  it("refuses a taken slug with a field error and creates nothing", async () => {
    signInAs("operator@hangarline.test");
    const before = db().select().from(clubs).all().length;
    const state = await createClub(EMPTY, form({ ...newClub, slug: "lakeshore-aero", adminEmail: "x@y.test" }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.slug?.[0]).toMatch(/another club/i);
    expect(db().select().from(clubs).all().length).toBe(before);
  });

  it("appoints an existing account as admin directly", async () => {
    signInAs("operator@hangarline.test");
    const club = clubBySlug("juniper-ridge");
    const state = await assignClubAdmin(EMPTY, form({ clubId: club.id, adminEmail: "member@hangarline.test" }));
    expect(state.ok).toBe(true);
    expect(membershipOf("member@hangarline.test", "juniper-ridge")?.roles).toEqual(["member", "admin"]);
  });

  it("a club admin who is not an operator can neither create clubs nor appoint admins", async () => {
    signInAs("admin@hangarline.test");
    const before = db().select().from(clubs).all().length;
    expect((await createClub(EMPTY, form({ ...newClub, slug: "sneaky-club", adminEmail: "a@b.test" }))).ok).toBe(false);
    expect(db().select().from(clubs).all().length).toBe(before);
    const cottonwood = clubBySlug("cottonwood-flyers");
    const state = await assignClubAdmin(EMPTY, form({ clubId: cottonwood.id, adminEmail: "admin@hangarline.test" }));
    expect(state.ok).toBe(false);
    expect(membershipOf("admin@hangarline.test", "cottonwood-flyers")).toBeUndefined();
  });
});
