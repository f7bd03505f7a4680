import { beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { GET as membersRoute } from "@/app/api/clubs/[club]/members/route";
import MembersPage from "@/app/clubs/[club]/members/page";
import { auditLog, clubs, invitations, memberships, operatorAssignments, users } from "@/db/schema";
import { acceptInvitation } from "@/lib/actions/invitations/accept-invitation";
import { resolveClubContext } from "@/lib/server/club-context";
import { createClub } from "@/lib/actions/operator/create-club";
import { assignClubAdmin } from "@/lib/actions/operator/assign-admin";
import { listOperatorClubSummaries } from "@/db/queries/operator";
import { EMPTY, clubBySlug, db, expectRedirect, form, membershipOf, outboxFor, seedOnce, signInAs } from "./helpers";

const newClub = { name: "Juniper Ridge Flyers", slug: "juniper-ridge", timeZone: "America/Denver", currency: "USD", unitSystem: "imperial" };

describe("operator console", () => {
  beforeAll(async () => {
    await seedOnce();
  });

  it("summarises each club with counts and totals only, no member-level detail", () => {
    const operator = signInAs("operator@hangarline.test")!;
    const summaries = listOperatorClubSummaries(db(), operator);
    expect(summaries.map((s) => s.slug).sort()).toEqual(["aeroclub-silberau", "cottonwood-flyers", "reedwater"]);
    for (const s of summaries) {
      // Club facts, then numbers only: no list of people anywhere in the shape.
      expect(Object.keys(s).sort()).toEqual(["activeMembers", "admins", "currency", "fleet", "id", "locale", "name", "receivables", "slug", "timeZone", "unitSystem"]);
      expect(Object.keys(s.fleet).sort()).toEqual(["flyable", "grounded", "limited", "unknown"]);
      expect(Object.keys(s.receivables).sort()).toEqual(["over30Minor", "over90Minor", "totalMinor"]);
      for (const n of [s.activeMembers, s.admins, ...Object.values(s.fleet), ...Object.values(s.receivables)]) expect(Number.isInteger(n)).toBe(true);
      expect(s.activeMembers).toBeGreaterThan(0);
    }
    const text = JSON.stringify(summaries);
    for (const u of db().select({ id: users.id, email: users.email, name: users.name }).from(users).all()) {
      expect(text).not.toContain(u.id);
      expect(text).not.toContain(u.email);
      if (u.name) expect(text).not.toContain(u.name);
    }
  });

  it("gives anyone who is not an operator no summaries at all", () => {
    const admin = signInAs("admin@hangarline.test")!;
    expect(listOperatorClubSummaries(db(), admin)).toEqual([]);
    // Even with assignments, a person without the operator role sees nothing.
    expect(listOperatorClubSummaries(db(), { id: signInAs("operator@hangarline.test")!.id, platformRole: null })).toEqual([]);
  });

  it("an operator holds no membership in the demo and reads none of a club's member-level pages", async () => {
    const operator = signInAs("operator@hangarline.test")!;
    expect(db().select().from(memberships).where(eq(memberships.userId, operator.id)).all()).toEqual([]);
    for (const slug of ["reedwater", "cottonwood-flyers", "aeroclub-silberau"]) {
      expect(await resolveClubContext(slug)).toEqual({ ok: false, code: "not_found" });
      const res = await membersRoute(new Request(`http://app.test/api/clubs/${slug}/members`), { params: Promise.resolve({ club: slug }) });
      expect(res.status).toBe(404);
      expect(await res.text()).not.toMatch(/@hangarline\.test/);
      await expect(MembersPage({ params: Promise.resolve({ club: slug }), searchParams: Promise.resolve({}) } as never)).rejects.toThrow("not found");
    }
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
    const state = await createClub(EMPTY, form({ ...newClub, slug: "reedwater", adminEmail: "x@y.test" }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.slug?.[0]).toMatch(/another club/i);
    expect(db().select().from(clubs).all().length).toBe(before);
  });

  it("refuses an operator who names themselves, with a clear message, and creates nothing", async () => {
    const operator = signInAs("operator@hangarline.test")!;
    const club = clubBySlug("juniper-ridge");
    const invitationsBefore = db().select().from(invitations).all().length;
    const self = await assignClubAdmin(EMPTY, form({ clubId: club.id, adminEmail: "Operator@Hangarline.test" }));
    expect(self.ok).toBe(false);
    expect(self.message).toMatch(/cannot appoint yourself/);
    expect(self.fieldErrors.adminEmail?.[0]).toMatch(/not your own/);
    const clubsBefore = db().select().from(clubs).all().length;
    const created = await createClub(EMPTY, form({ ...newClub, slug: "self-run-club", adminEmail: operator.email }));
    expect(created.ok).toBe(false);
    expect(created.message).toMatch(/cannot appoint yourself/);
    expect(db().select().from(clubs).all().length).toBe(clubsBefore);
    expect(db().select().from(invitations).all().length).toBe(invitationsBefore);
    expect(db().select().from(memberships).where(eq(memberships.userId, operator.id)).all()).toEqual([]);
  });

  it("appointing an existing account sends an invitation only; the role exists once the appointee accepts", async () => {
    signInAs("operator@hangarline.test");
    const club = clubBySlug("juniper-ridge");
    const sentBefore = outboxFor("member@hangarline.test").length;
    const state = await assignClubAdmin(EMPTY, form({ clubId: club.id, adminEmail: "member@hangarline.test" }));
    expect(state).toMatchObject({ ok: true });
    expect(state.message).toMatch(/invited/);
    expect(membershipOf("member@hangarline.test", "juniper-ridge")).toBeUndefined();
    const inv = db().select().from(invitations).where(and(eq(invitations.clubId, club.id), eq(invitations.email, "member@hangarline.test"))).get()!;
    expect(inv).toMatchObject({ roles: ["member", "admin"], acceptedAt: null, revokedAt: null });
    const mail = outboxFor("member@hangarline.test").slice(sentBefore);
    expect(mail.map((m) => m.template)).toEqual(["invitation"]);
    const token = /\/invitations\/([^/?]+)/.exec((mail[0]!.payload as { url: string }).url)![1]!;
    // Someone else cannot take it up.
    signInAs("pilot2@hangarline.test");
    expect((await acceptInvitation(EMPTY, form({ token }))).ok).toBe(false);
    expect(membershipOf("member@hangarline.test", "juniper-ridge")).toBeUndefined();
    signInAs("member@hangarline.test");
    await expectRedirect(() => acceptInvitation(EMPTY, form({ token })));
    expect(membershipOf("member@hangarline.test", "juniper-ridge")).toMatchObject({ status: "active", roles: ["member", "admin"] });
  });

  it("an operator who appoints an admin of an existing club grants nothing before acceptance", async () => {
    signInAs("operator@hangarline.test");
    const reedwater = clubBySlug("reedwater");
    const before = membershipOf("pilot2@hangarline.test", "reedwater")!;
    expect(before.roles).not.toContain("admin");
    expect((await assignClubAdmin(EMPTY, form({ clubId: reedwater.id, adminEmail: "pilot2@hangarline.test" }))).ok).toBe(true);
    expect(membershipOf("pilot2@hangarline.test", "reedwater")!.roles).toEqual(before.roles);
    // An address that already holds the admin role is told so.
    const again = await assignClubAdmin(EMPTY, form({ clubId: reedwater.id, adminEmail: "admin@hangarline.test" }));
    expect(again.ok).toBe(false);
    expect(again.message).toMatch(/already an admin/);
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
