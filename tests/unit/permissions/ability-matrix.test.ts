import { describe, expect, it } from "vitest";
import { ACTIONS, ROLES, SUBJECTS, defineAbilityFor, explainDenied, own, rolesThatAllow, type Action, type Role, type SubjectName } from "@/permissions";

// The whole role × action × subject matrix, written out by hand from PRODUCT.md's roles. A
// change to permissions/abilities.ts that is not also made here fails this test on purpose.
// "own:" entries are allowed only on the person's own records (checked separately below).
const MATRIX: Record<Role, string[]> = {
  member: [
    "read:Club", "read:Member", "read:Aircraft", "read:Inspection", "read:Squawk", "read:GroundingNotice", "read:Flight",
    "read:Booking", "read:Bulletin", "read:Checkout", "read:Tools", "read:Upload",
    "create:Squawk", "create:Flight", "create:Booking", "create:SafetyReport", "create:Upload", "acknowledge:Bulletin",
    "own:update:Booking", "own:read:SafetyReport", "own:readDetails:SafetyReport",
    "own:read:Currency", "own:create:Currency", "own:update:Currency",
    "own:read:MemberDocument", "own:create:MemberDocument", "own:update:MemberDocument",
    "own:read:Medical", "own:readDetails:Medical", "own:update:Medical", "own:read:Account", "own:pay:Account",
  ],
  instructor: ["read:CurrencyBoard", "read:Currency", "read:MemberDocument", "verify:Currency", "create:Checkout", "update:Checkout", "create:Booking", "update:Booking", "create:Flight", "update:Flight", "create:Availability", "update:Availability"],
  safety: [
    "create:Bulletin", "publish:Bulletin", "update:Bulletin", "readAcknowledgements:Bulletin", "export:Bulletin",
    "read:SafetyReport", "readDetails:SafetyReport", "triage:SafetyReport", "update:SafetyReport",
    "create:GroundingNotice", "lift:GroundingNotice", "read:CurrencyBoard", "read:Currency", "read:MemberDocument", "verify:Currency",
  ],
  treasurer: [
    "read:Ledger", "create:Ledger", "export:Ledger", "read:Account", "export:Account", "create:Payment", "refund:Payment", "read:Payment",
    "read:Reconciliation", "reconcile:Reconciliation", "read:Rates", "update:Rates", "read:Member",
    "read:Bill", "create:Bill", "approve:Bill",
  ],
  maintenance: [
    "create:Aircraft", "update:Aircraft", "create:Inspection", "update:Inspection", "record:Inspection",
    "triage:Squawk", "close:Squawk", "update:Squawk", "create:GroundingNotice", "lift:GroundingNotice", "update:Flight",
    "create:MaintenanceBlock", "update:MaintenanceBlock",
  ],
  admin: [
    "read:Club", "update:Club", "read:ClubSettings", "update:ClubSettings",
    "read:Member", "invite:Member", "assignRoles:Member", "deactivate:Member", "update:Member",
    "read:Invitation", "create:Invitation", "update:Invitation", "read:AuditLog", "read:Outbox", "readAcknowledgements:Bulletin",
    "read:CurrencyBoard", "read:Currency", "read:MemberDocument", "read:Medical", "readDetails:Medical",
    "read:Account", "export:Account", "read:Ledger", "export:Ledger", "create:Aircraft", "update:Aircraft",
    "read:Bill", "approve:Bill",
  ],
  mechanic: [
    "read:Club", "read:Aircraft", "read:Inspection", "read:Squawk", "read:GroundingNotice", "read:Flight", "read:Upload",
    "create:Inspection", "update:Inspection", "record:Inspection", "create:Squawk", "triage:Squawk", "close:Squawk", "update:Squawk",
    "create:Upload", "lift:GroundingNotice",
  ],
};

const ME = "user-me";
const SOMEONE_ELSE = "user-other";

function expectation(role: Role, action: Action, subjectName: SubjectName): "yes" | "own" | "no" {
  const list = MATRIX[role];
  if (list.includes(`${action}:${subjectName}`)) return "yes";
  if (list.includes(`own:${action}:${subjectName}`)) return "own";
  return "no";
}

describe("ability matrix: every role × action × subject", () => {
  for (const role of ROLES) {
    it(`${role}`, () => {
      const ability = defineAbilityFor({ userId: ME, roles: [role] });
      const mismatches: string[] = [];
      for (const action of ACTIONS) {
        if (action === "manage") continue;
        for (const subjectName of SUBJECTS) {
          const want = expectation(role, action, subjectName);
          const mine = own(subjectName, ME, { reporterId: ME });
          const theirs = own(subjectName, SOMEONE_ELSE, { reporterId: SOMEONE_ELSE });
          const got = ability.can(action, theirs) ? "yes" : ability.can(action, mine) ? "own" : "no";
          if (got !== want) mismatches.push(`${action}:${subjectName} expected ${want}, got ${got}`);
        }
      }
      expect(mismatches).toEqual([]);
    });
  }

  it("adds up the abilities of several roles", () => {
    const ability = defineAbilityFor({ userId: ME, roles: ["member", "treasurer"] });
    expect(ability.can("read", own("Account", SOMEONE_ELSE))).toBe(true);
    expect(ability.can("reconcile", "Reconciliation")).toBe(true);
    expect(ability.can("triage", "Squawk")).toBe(false);
  });

  it("gives no role the right to read someone else's anonymous-or-named safety report except the safety officer", () => {
    for (const role of ROLES) {
      const can = defineAbilityFor({ userId: ME, roles: [role] }).can("read", own("SafetyReport", SOMEONE_ELSE, { reporterId: SOMEONE_ELSE }));
      expect(can, role).toBe(role === "safety");
    }
  });

  it("keeps maintenance and mechanics away from money", () => {
    for (const role of ["maintenance", "mechanic"] as const) {
      const ability = defineAbilityFor({ userId: ME, roles: [role] });
      for (const s of ["Ledger", "Account", "Payment", "Reconciliation", "Rates"] as const) expect(ability.can("read", s), `${role} ${s}`).toBe(false);
    }
  });

  it("explains a refusal by naming the roles that could", () => {
    expect(rolesThatAllow("invite", "Member")).toEqual(["admin"]);
    expect(explainDenied("invite", "Member")).toBe("Only a club admin can do this.");
    expect(explainDenied("reconcile", "Reconciliation")).toBe("Only a treasurer can do this.");
    expect(explainDenied("triage", "Squawk")).toBe("Only a maintenance officer can do this.");
    expect(explainDenied("create", "Checkout")).toBe("Only an instructor can do this.");
  });
});
