import { AbilityBuilder, createMongoAbility, subject, type MongoAbility } from "@casl/ability";
import { ROLES, ROLE_LABELS, type Role } from "./roles";
import type { Action, SubjectName } from "./subjects";

export type AppAbility = MongoAbility<[Action, SubjectName | Record<string, unknown>]>;

/** A record to check against conditions, e.g. own("Account", userId) for "their own account". */
export function own(name: SubjectName, userId: string, extra: Record<string, unknown> = {}): Record<string, unknown> {
  return subject(name, { userId, ...extra }) as unknown as Record<string, unknown>;
}

export type AbilityInput = { userId: string; roles: readonly Role[] };

type Builder = AbilityBuilder<AppAbility>;

// The one permission table: what each role grants inside its club. Abilities of several roles
// add up. Rules with { userId } apply to the person's own records only.
const GRANTS: Record<Role, (b: Builder, userId: string) => void> = {
  member: ({ can }, userId) => {
    can("read", ["Club", "Member", "Aircraft", "Inspection", "Squawk", "GroundingNotice", "Flight", "Booking", "Bulletin", "Checkout", "Tools", "Upload"]);
    can("create", ["Squawk", "Flight", "Booking", "SafetyReport", "Upload"]);
    can("acknowledge", "Bulletin");
    can("update", "Booking", { userId });
    can(["read", "readDetails"], "SafetyReport", { reporterId: userId });
    can(["read", "create", "update"], ["Currency", "MemberDocument"], { userId });
    can(["read", "readDetails", "update"], "Medical", { userId });
    can(["read", "pay"], "Account", { userId });
  },
  instructor: ({ can }) => {
    can("read", ["CurrencyBoard", "Currency", "MemberDocument"]);
    // Verify a member's claimed flight review, medical or outside flight against the logbook.
    can("verify", "Currency");
    can(["create", "update"], "Checkout");
    can(["create", "update"], ["Booking", "Flight"]);
    // Their own available times (the action writes only the signed-in instructor's windows).
    can(["create", "update"], "Availability");
  },
  safety: ({ can }) => {
    can(["create", "publish", "update", "readAcknowledgements", "export"], "Bulletin");
    can(["read", "readDetails", "triage", "update"], "SafetyReport");
    can(["create", "lift"], "GroundingNotice");
    can("read", ["CurrencyBoard", "Currency", "MemberDocument"]);
    can("verify", "Currency");
  },
  treasurer: ({ can }) => {
    can(["read", "create", "export"], "Ledger");
    can(["read", "export"], "Account");
    can(["create", "refund", "read"], "Payment");
    can(["read", "reconcile"], "Reconciliation");
    can(["read", "update"], "Rates");
    can(["read", "create", "approve"], "Bill");
    can("read", "Member");
  },
  maintenance: ({ can }) => {
    can(["create", "update"], ["Aircraft", "Inspection"]);
    can(["record"], "Inspection");
    can(["triage", "close", "update"], "Squawk");
    can(["create", "lift"], "GroundingNotice");
    can("update", "Flight");
    // Blocks an aircraft's time on the booking page (an inspection, a repair); the guard refuses bookings over it.
    can(["create", "update"], "MaintenanceBlock");
  },
  admin: ({ can }) => {
    can(["read", "update"], ["Club", "ClubSettings"]);
    can(["read", "invite", "assignRoles", "deactivate", "update"], "Member");
    can(["read", "create", "update"], "Invitation");
    can("read", ["AuditLog", "Outbox"]);
    can("readAcknowledgements", "Bulletin");
    can("read", ["CurrencyBoard", "Currency", "MemberDocument"]);
    can(["read", "readDetails"], "Medical");
    can(["read", "export"], ["Account", "Ledger"]);
    // A second officer for bills above the club's approval amount.
    can(["read", "approve"], "Bill");
    can(["create", "update"], "Aircraft");
  },
  // A mechanic sees the aircraft records of this one club and nothing about its people or money.
  mechanic: ({ can }) => {
    can("read", ["Club", "Aircraft", "Inspection", "Squawk", "GroundingNotice", "Flight", "Upload"]);
    can(["create", "update", "record"], "Inspection");
    can(["create", "triage", "close", "update"], "Squawk");
    can("create", "Upload");
    can("lift", "GroundingNotice");
  },
};

export function defineAbilityFor({ userId, roles }: AbilityInput): AppAbility {
  const builder = new AbilityBuilder<AppAbility>(createMongoAbility);
  for (const role of new Set(roles)) GRANTS[role](builder, userId);
  // Nobody, whatever their roles, reads who filed an anonymous report: it is not stored.
  return builder.build();
}

// The table never changes while the process runs: one probe ability per role, and each
// question's answer, are worked out once.
let probes: Map<Role, AppAbility> | null = null;
const allowedBy = new Map<string, Role[]>();

/** Roles that would allow `action` on `subject` (type-level), for "why is this disabled". */
export function rolesThatAllow(action: Action, subject: SubjectName): Role[] {
  const key = `${action}\u0000${subject}`;
  let roles = allowedBy.get(key);
  if (!roles) {
    probes ??= new Map(ROLES.map((role) => [role, defineAbilityFor({ userId: "__probe__", roles: [role] })]));
    roles = ROLES.filter((role) => probes!.get(role)!.rulesFor(action, subject).some((r) => !r.inverted));
    allowedBy.set(key, roles);
  }
  return [...roles];
}

/** Plain-words reason shown beside a hidden or disabled control. */
export function explainDenied(action: Action, subject: SubjectName): string {
  const roles = rolesThatAllow(action, subject).filter((r) => r !== "mechanic");
  if (roles.length === 0) return "No role in this club can do this.";
  const names = roles.map((r) => ROLE_LABELS[r].toLowerCase());
  const list = names.length === 1 ? names[0] : `${names.slice(0, -1).join(", ")} or ${names.at(-1)}`;
  return `Only ${/^[aeiou]/.test(list ?? "") ? "an" : "a"} ${list} can do this.`;
}
