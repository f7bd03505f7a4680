import { beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { auditLog, invitations, users } from "@/db/schema";
import { changeRoles } from "@/lib/actions/members/change-roles";
import { inviteMember } from "@/lib/actions/members/invite-member";
import { setMembershipStatus } from "@/lib/actions/members/set-membership-status";
import { acceptInvitation } from "@/lib/actions/invitations/accept-invitation";
import { authorizeCredentials } from "@/lib/auth/credentials";
import { EMPTY, clubBySlug, db, expectRedirect, form, membershipOf, outboxFor, seedOnce, signInAs } from "./helpers";

function tokenFromOutbox(address: string): string {
  const rows = outboxFor(address);
  const payload = rows.at(-1)?.payload as { url?: string } | undefined;
  const token = payload?.url?.split("/invitations/")[1];
  if (!token) throw new Error(`No invitation link for ${address}`);
  return token;
}

describe("invitations and roles", () => {
  beforeAll(async () => {
    await seedOnce();
  });

  it("an admin invites by e-mail: an invitation row, an outbox message with the link, an audit entry", async () => {
    signInAs("admin@hangarline.test");
    const state = await inviteMember(EMPTY, form({ club: "reedwater", email: "New.Pilot@Example.test", roles: ["member"] }));
    expect(state).toMatchObject({ ok: true });
    const rows = outboxFor("new.pilot@example.test");
    expect(rows).toHaveLength(1);
    expect(rows[0]!.template).toBe("invitation");
    expect(String((rows[0]!.payload as { url: string }).url)).toMatch(/^http:\/\/app\.test\/invitations\/[\w-]{40,}$/);
    const club = clubBySlug("reedwater");
    const audit = db().select().from(auditLog).where(and(eq(auditLog.clubId, club.id), eq(auditLog.action, "member.invite"))).all();
    expect(audit.length).toBeGreaterThanOrEqual(1);
  });

  it("rejects bad input with field errors and writes nothing", async () => {
    signInAs("admin@hangarline.test");
    const before = db().select().from(invitations).all().length;
    const state = await inviteMember(EMPTY, form({ club: "reedwater", email: "not an address", roles: ["pilot-in-chief"] }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.email?.[0]).toMatch(/valid e-mail/);
    expect(Object.keys(state.fieldErrors).some((k) => k.startsWith("roles"))).toBe(true);
    expect(db().select().from(invitations).all().length).toBe(before);
  });

  it("a plain member cannot invite, and is told who can", async () => {
    signInAs("member@hangarline.test");
    const state = await inviteMember(EMPTY, form({ club: "reedwater", email: "x@example.test", roles: ["member"] }));
    expect(state.ok).toBe(false);
    expect(state.message).toMatch(/club admin/i);
    expect(outboxFor("x@example.test")).toHaveLength(0);
  });

  it("accepting without an account signs the person up with a password and joins the club", async () => {
    signInAs(null);
    const token = tokenFromOutbox("new.pilot@example.test");
    const to = await expectRedirect(() => acceptInvitation(EMPTY, form({ token, name: "Nova Pilot", password: "correct-horse-hangar" })));
    expect(to).toMatch(/^\/sign-in\?joined=1/);
    expect(membershipOf("new.pilot@example.test", "reedwater")?.roles).toEqual(["member"]);
    const signedIn = await authorizeCredentials(db(), { email: "new.pilot@example.test", password: "correct-horse-hangar" }, "client:test");
    expect(signedIn.ok).toBe(true);
    // The link works once.
    const again = await acceptInvitation(EMPTY, form({ token, name: "Someone", password: "another-long-pass" }));
    expect(again.ok).toBe(false);
    expect(db().select().from(users).where(eq(users.email, "new.pilot@example.test")).all()).toHaveLength(1);
  });

  it("an admin changes roles, with before and after in the audit log", async () => {
    const admin = signInAs("admin@hangarline.test")!;
    const m = membershipOf("student@hangarline.test", "reedwater")!;
    const state = await changeRoles(EMPTY, form({ club: "reedwater", membershipId: m.id, roles: ["member", "instructor"] }));
    expect(state.ok).toBe(true);
    expect(membershipOf("student@hangarline.test", "reedwater")!.roles).toEqual(["member", "instructor"]);
    const entry = db().select().from(auditLog).where(and(eq(auditLog.subjectId, m.id), eq(auditLog.action, "member.roles.change"))).get();
    expect(entry).toMatchObject({ actorId: admin.id, before: { roles: ["member"] }, after: { roles: ["member", "instructor"] } });
  });

  it("keeps the last admin: removing the only admin role is refused", async () => {
    signInAs("admin@hangarline.test");
    const m = membershipOf("admin@hangarline.test", "reedwater")!;
    const state = await changeRoles(EMPTY, form({ club: "reedwater", membershipId: m.id, roles: ["member"] }));
    expect(state.ok).toBe(false);
    expect(state.message).toMatch(/last active admin/);
    expect(membershipOf("admin@hangarline.test", "reedwater")!.roles).toContain("admin");
  });

  it("deactivates and reactivates a member; history stays", async () => {
    signInAs("admin@hangarline.test");
    const m = membershipOf("pilot2@hangarline.test", "reedwater")!;
    expect((await setMembershipStatus(EMPTY, form({ club: "reedwater", membershipId: m.id, status: "inactive" }))).ok).toBe(true);
    expect(membershipOf("pilot2@hangarline.test", "reedwater")!.status).toBe("inactive");
    expect((await setMembershipStatus(EMPTY, form({ club: "reedwater", membershipId: m.id, status: "active" }))).ok).toBe(true);
    expect(membershipOf("pilot2@hangarline.test", "reedwater")!.status).toBe("active");
  });

  it("an admin of one club cannot change another club's members", async () => {
    signInAs("admin@hangarline.test"); // admin of reedwater only
    const other = membershipOf("cottonwood.pilot@hangarline.test", "cottonwood-flyers")!;
    const viaOwnClub = await changeRoles(EMPTY, form({ club: "reedwater", membershipId: other.id, roles: ["member", "admin"] }));
    expect(viaOwnClub.ok).toBe(false);
    expect(viaOwnClub.message).toMatch(/not found/i);
    const viaOtherClub = await changeRoles(EMPTY, form({ club: "cottonwood-flyers", membershipId: other.id, roles: ["member", "admin"] }));
    expect(viaOtherClub.ok).toBe(false);
    expect(viaOtherClub.message).toMatch(/club was not found/i);
    const deactivate = await setMembershipStatus(EMPTY, form({ club: "cottonwood-flyers", membershipId: other.id, status: "inactive" }));
    expect(deactivate.ok).toBe(false);
    expect(membershipOf("cottonwood.pilot@hangarline.test", "cottonwood-flyers")!).toMatchObject({ roles: ["member"], status: "active" });
  });

  it("a deactivated member loses access to the club", async () => {
    signInAs("admin@hangarline.test");
    const m = membershipOf("student@hangarline.test", "reedwater")!;
    await setMembershipStatus(EMPTY, form({ club: "reedwater", membershipId: m.id, status: "inactive" }));
    signInAs("student@hangarline.test");
    const attempt = await inviteMember(EMPTY, form({ club: "reedwater", email: "y@example.test", roles: ["member"] }));
    expect(attempt.message).toMatch(/club was not found/i);
  });
});
