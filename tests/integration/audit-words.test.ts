import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { listAuditEntries } from "@/db/queries/audit";
import { auditLog, memberships, users } from "@/db/schema";
import { changeRoles } from "@/lib/actions/members/change-roles";
import { EMPTY, clubBySlug, db, form, seedOnce, signInAs } from "./helpers";

const SLUG = "reedwater";

describe("the audit log reads as sentences in the club's time", () => {
  beforeAll(async () => {
    await seedOnce();
  });

  it("a role change names who did it, whose roles, the change in words and the club-local time", async () => {
    const club = clubBySlug(SLUG);
    signInAs("admin@hangarline.test");
    const member = db().select().from(users).where(eq(users.email, "pilot2@hangarline.test")).get()!;
    const membership = db().select().from(memberships).where(and(eq(memberships.clubId, club.id), eq(memberships.userId, member.id))).get()!;
    const answer = await changeRoles(EMPTY, form({ club: SLUG, membershipId: membership.id, roles: ["member", "instructor"] }));
    expect(answer.ok, answer.message).toBe(true);

    const row = db().select().from(auditLog).where(and(eq(auditLog.clubId, club.id), eq(auditLog.action, "member.roles.change"))).get()!;
    const entry = listAuditEntries(db(), club).find((e) => e.id === row.id)!;
    expect(entry.sentence).toBe(`Abena Carrow changed a member's roles (${member.name}).`);
    expect(entry.details).toEqual(["roles: member → member, instructor"]);
    // The club's own wall clock, with its zone's short name, never a raw instant.
    const expectedWhen = new Intl.DateTimeFormat("en-GB", { timeZone: club.timeZone, weekday: "short", day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", hourCycle: "h23", timeZoneName: "short" }).format(row.createdAt);
    expect(entry.when).toBe(expectedWhen);
    expect(entry.when).not.toMatch(/T\d{2}:\d{2}|Z$/);
  });

  it("no entry shows raw JSON or a record id", () => {
    const club = clubBySlug(SLUG);
    const entries = listAuditEntries(db(), club);
    expect(entries.length).toBeGreaterThan(0);
    const ids = db().select({ id: auditLog.subjectId }).from(auditLog).where(eq(auditLog.clubId, club.id)).all().map((r) => r.id);
    for (const e of entries) {
      const text = [e.sentence, ...e.details].join("\n");
      expect(text).not.toMatch(/[{}"]/);
      for (const id of ids) if (id.length > 12) expect(text).not.toContain(id);
    }
  });

  it("another club's entries are not in this club's log", () => {
    const other = clubBySlug("cottonwood-flyers");
    const mine = new Set(listAuditEntries(db(), clubBySlug(SLUG)).map((e) => e.id));
    const theirs = db().select({ id: auditLog.id }).from(auditLog).where(eq(auditLog.clubId, other.id)).all();
    for (const t of theirs) expect(mine.has(t.id)).toBe(false);
  });
});
