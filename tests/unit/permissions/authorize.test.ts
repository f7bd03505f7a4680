import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { visibleBookingWarnings } from "@/lib/bookings/warning-access";
import {
  ACTIONS, CONDITIONAL_PERMISSIONS, ConditionalSubjectError, ROLES, SUBJECTS,
  allows, can, canAll, canOn, defineAbilityFor, isConditional, type Action, type Role, type SubjectName,
} from "@/permissions";

// The pairs the permission table grants only on a person's own records, written out by hand
// from permissions/abilities.ts (the member role). A new conditional rule fails this on purpose.
const CONDITIONAL = [
  "update:Booking",
  "read:SafetyReport", "readDetails:SafetyReport",
  "read:Currency", "create:Currency", "update:Currency",
  "read:MemberDocument", "create:MemberDocument", "update:MemberDocument",
  "read:Medical", "readDetails:Medical", "update:Medical",
  "read:Account", "pay:Account",
];

const ME = "user-me";
const OTHER = "user-other";
// Each conditional subject's owner field, as the rules name it.
const ownerField = (s: SubjectName) => (s === "SafetyReport" ? "reporterId" : "userId");

describe("the authorization helper over the permission table", () => {
  it("knows exactly which pairs have conditions", () => {
    expect([...CONDITIONAL_PERMISSIONS].sort()).toEqual([...CONDITIONAL].sort());
    expect(isConditional("read", "Account")).toBe(true);
    expect(isConditional("export", "Account")).toBe(false);
  });

  it("refuses a type-level question on a conditional subject, for every role", () => {
    for (const role of ROLES) {
      const ability = defineAbilityFor({ userId: ME, roles: [role] });
      for (const pair of CONDITIONAL) {
        const [action, subject] = pair.split(":") as [Action, SubjectName];
        expect(() => can(ability, action, subject), `${role} ${pair}`).toThrow(ConditionalSubjectError);
        expect(() => allows(ability, [action, subject]), `${role} ${pair}`).toThrow(ConditionalSubjectError);
      }
    }
  });

  it("answers type-level questions on unconditional subjects as the table does", () => {
    const member = defineAbilityFor({ userId: ME, roles: ["member"] });
    expect(can(member, "read", "Aircraft")).toBe(true);
    expect(can(member, "read", "Ledger")).toBe(false);
    expect(can(defineAbilityFor({ userId: ME, roles: ["treasurer"] }), "read", "Ledger")).toBe(true);
  });

  // canAll: yes only for an unconditional grant. canOn: the record's owner decides.
  for (const role of ROLES) {
    it(`${role}: canAll and canOn agree with the rules, record by record`, () => {
      const ability = defineAbilityFor({ userId: ME, roles: [role] });
      const wrong: string[] = [];
      for (const action of ACTIONS) {
        if (action === "manage") continue;
        for (const subject of SUBJECTS) {
          const unconditional = ability.rules.some((r) => !r.inverted && !r.conditions && [r.action].flat().includes(action) && [r.subject].flat().includes(subject));
          const ownRule = ability.rules.some((r) => !r.inverted && !!r.conditions && [r.action].flat().includes(action) && [r.subject].flat().includes(subject));
          const field = ownerField(subject);
          if (canAll(ability, action, subject) !== unconditional) wrong.push(`canAll ${action}:${subject}`);
          if (canOn(ability, action, subject, { [field]: OTHER }) !== unconditional) wrong.push(`canOn other ${action}:${subject}`);
          if (canOn(ability, action, subject, { [field]: ME }) !== (unconditional || ownRule)) wrong.push(`canOn own ${action}:${subject}`);
        }
      }
      expect(wrong).toEqual([]);
    });
  }

  it("a member's own-account rule never answers 'may read every account'", () => {
    const member = defineAbilityFor({ userId: ME, roles: ["member"] });
    expect(canAll(member, "read", "Account")).toBe(false);
    expect(canOn(member, "read", "Account", { userId: ME })).toBe(true);
    expect(canOn(member, "read", "Account", { userId: OTHER })).toBe(false);
    expect(allows(member, ["read", "Account", "all"])).toBe(false);
    expect(allows(member, ["read", "Account", { userId: ME }])).toBe(true);
    for (const role of ["treasurer", "admin"] as Role[]) {
      const ability = defineAbilityFor({ userId: ME, roles: ["member", role] });
      expect(canAll(ability, "read", "Account"), role).toBe(true);
      expect(canOn(ability, "read", "Account", { userId: OTHER }), role).toBe(true);
    }
  });

  it("an inverted rule takes 'every record' away", async () => {
    const { AbilityBuilder, createMongoAbility } = await import("@casl/ability");
    const b = new AbilityBuilder<ReturnType<typeof defineAbilityFor>>(createMongoAbility);
    b.can("read", "Account");
    b.cannot("read", "Account", { userId: OTHER });
    const ability = b.build();
    expect(canAll(ability, "read", "Account")).toBe(false);
    expect(canOn(ability, "read", "Account", { userId: ME })).toBe(true);
    expect(canOn(ability, "read", "Account", { userId: OTHER })).toBe(false);
  });

  it("rejects unknown actions and subjects instead of answering no", () => {
    const ability = defineAbilityFor({ userId: ME, roles: ["admin"] });
    expect(() => can(ability, "fly" as Action, "Aircraft")).toThrow(/Unknown action/);
    expect(() => canAll(ability, "read", "Accounts" as SubjectName)).toThrow(/Unknown subject/);
  });
});

describe("booking warnings by viewer", () => {
  const booking = {
    userId: OTHER,
    instructorId: "user-instructor",
    acceptedWarnings: [
      { guard: "medicalExpired", reason: "Pat has no medical certificate on record (14 CFR 61.23)." },
      { guard: "inArrears", reason: "Pat's account is in arrears: $120.00 owed." },
    ],
  };
  const seen = (userId: string, roles: Role[]) => visibleBookingWarnings(defineAbilityFor({ userId, roles }), userId, booking).map((w) => w.guard);

  it("the booking's member sees every warning; its instructor those about flying, never the member's money", () => {
    expect(seen(OTHER, ["member"])).toEqual(["medicalExpired", "inArrears"]);
    expect(seen("user-instructor", ["member", "instructor"])).toEqual(["medicalExpired"]);
    // Even an instructor who holds no club-wide currency reading sees the flying warnings of a booking they fly on.
    expect(seen("user-instructor", ["member"])).toEqual(["medicalExpired"]);
  });

  it("another member sees none; each office sees the kind of data it reads for everyone", () => {
    expect(seen(ME, ["member"])).toEqual([]);
    expect(seen(ME, ["mechanic"])).toEqual([]);
    expect(seen(ME, ["member", "maintenance"])).toEqual([]);
    expect(seen(ME, ["member", "admin"])).toEqual(["medicalExpired", "inArrears"]);
    expect(seen(ME, ["member", "safety"])).toEqual(["medicalExpired"]);
    expect(seen(ME, ["member", "treasurer"])).toEqual(["inArrears"]);
  });
});

// Static guard: every page of a club checks its own permission through the helper, and no
// fixed permission in a page, handler or action names a conditional pair at type level.
describe("pages, handlers and actions ask through the helper", () => {
  const root = path.resolve(import.meta.dirname, "../../..");
  const walk = (dir: string, name: RegExp): string[] =>
    fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
      const p = path.join(dir, e.name);
      return e.isDirectory() ? walk(p, name) : name.test(e.name) ? [p] : [];
    });

  it("every page.tsx under app/clubs/[club] calls authorizePage or authorizePageAny", () => {
    const pages = walk(path.join(root, "app/clubs/[club]"), /^page\.tsx$/);
    expect(pages.length).toBeGreaterThan(40);
    const missing = pages.filter((p) => !/authorizePage(Any)?\(/.test(fs.readFileSync(p, "utf8"))).map((p) => path.relative(root, p));
    expect(missing).toEqual([]);
  });

  it("no fixed [action, Type] permission literal names a conditional pair", () => {
    const files = [...walk(path.join(root, "app"), /\.(ts|tsx)$/), ...walk(path.join(root, "lib"), /\.(ts|tsx)$/), ...walk(path.join(root, "components"), /\.(ts|tsx)$/)];
    const offending: string[] = [];
    for (const file of files) {
      const text = fs.readFileSync(file, "utf8");
      for (const m of text.matchAll(/\[\s*"(\w+)",\s*"([A-Z]\w+)"\s*\]/g)) {
        if (CONDITIONAL.includes(`${m[1]}:${m[2]}`)) offending.push(`${path.relative(root, file)}: ${m[0]}`);
      }
      for (const m of text.matchAll(/(?<![\w.])can\(\s*[\w.]+,\s*"(\w+)",\s*"(\w+)"\s*\)/g)) {
        if (CONDITIONAL.includes(`${m[1]}:${m[2]}`)) offending.push(`${path.relative(root, file)}: ${m[0]}`);
      }
    }
    expect(offending).toEqual([]);
  });
});
