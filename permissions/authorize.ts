import { subject as caslSubject } from "@casl/ability";
import { defineAbilityFor, type AppAbility } from "./abilities";
import { ROLES } from "./roles";
import { ACTIONS, SUBJECTS, type Action, type SubjectName } from "./subjects";

// The one way app code asks a permission question. Three questions, never confused:
//   can(ability, action, Type)         — a type with no conditions anywhere in the table;
//                                         refuses (throws) for a conditional pair.
//   canAll(ability, action, Type)      — "every record of this type": only an unconditional,
//                                         non-inverted grant answers yes.
//   canOn(ability, action, Type, rec)  — one record, checked against the rule's conditions.
// A plain `ability.can(action, "Account")` is true for a member because of the rule on their
// own account; asked by mistake it hands every member everyone's balances. So it is not asked.

/** "action:Subject" pairs that some role in the permission table grants only with conditions. */
export const CONDITIONAL_PERMISSIONS: ReadonlySet<string> = (() => {
  const out = new Set<string>();
  for (const role of ROLES) {
    const probe = defineAbilityFor({ userId: "__probe__", roles: [role] });
    for (const rule of probe.rules) {
      if (!rule.conditions) continue;
      const actions = ([] as string[]).concat(rule.action as string | string[]);
      const subjects = ([] as string[]).concat((rule.subject ?? []) as string | string[]);
      for (const a of actions) for (const s of subjects) out.add(`${a}:${s}`);
    }
  }
  return out;
})();

export function isConditional(action: Action, type: SubjectName): boolean {
  return CONDITIONAL_PERMISSIONS.has(`${action}:${type}`);
}

export class ConditionalSubjectError extends Error {
  constructor(action: Action, type: SubjectName) {
    super(
      `"${action} ${type}" depends on which ${type} (the permission table has conditions on it). ` +
        `Ask canOn(ability, "${action}", "${type}", record) for one record, or canAll(...) for every record.`,
    );
    this.name = "ConditionalSubjectError";
  }
}

function assertKnown(action: Action, type: SubjectName) {
  if (!(ACTIONS as readonly string[]).includes(action)) throw new Error(`Unknown action "${action}".`);
  if (!(SUBJECTS as readonly string[]).includes(type)) throw new Error(`Unknown subject "${type}".`);
}

/** Type-level question for a subject without conditions. Throws for a conditional pair. */
export function can(ability: AppAbility, action: Action, type: SubjectName): boolean {
  assertKnown(action, type);
  if (isConditional(action, type)) throw new ConditionalSubjectError(action, type);
  return ability.can(action, type);
}

/**
 * True only when an unconditional, non-inverted rule grants `action` on every `type` (and no
 * inverted rule of higher priority takes any of it away). A rule on one's own records never
 * answers "may read every account".
 */
export function canAll(ability: AppAbility, action: Action, type: SubjectName): boolean {
  assertKnown(action, type);
  for (const rule of ability.rulesFor(action, type)) {
    if (rule.inverted) return false;
    if (!rule.conditions && !rule.fields) return true;
  }
  return false;
}

/** The record form CASL checks conditions on: the type tag plus the fields the rules name. */
export function record(type: SubjectName, fields: Record<string, unknown>): Record<string, unknown> {
  return caslSubject(type, { ...fields }) as unknown as Record<string, unknown>;
}

/** One record: its fields are checked against the rule's conditions (e.g. { userId }). */
export function canOn(ability: AppAbility, action: Action, type: SubjectName, fields: Record<string, unknown>): boolean {
  assertKnown(action, type);
  return ability.can(action, record(type, fields));
}

/** Shorthand for the common instance: a record owned by `userId` (an account, a medical). */
export function canOnOwnedBy(ability: AppAbility, action: Action, type: SubjectName, userId: string): boolean {
  return canOn(ability, action, type, { userId });
}

/**
 * A permission as handed to pages, handlers and actions:
 *  - [action, Type]            type-level; refused for conditional pairs
 *  - [action, Type, "all"]     every record of the type (unconditional grant only)
 *  - [action, Type, { ...fields }] one record
 */
export type Permission =
  | readonly [Action, SubjectName]
  | readonly [Action, SubjectName, "all"]
  | readonly [Action, SubjectName, Record<string, unknown>];

export function allows(ability: AppAbility, permission: Permission): boolean {
  const [action, type, scope] = permission;
  if (scope === undefined) return can(ability, action, type);
  if (scope === "all") return canAll(ability, action, type);
  return canOn(ability, action, type, scope);
}
