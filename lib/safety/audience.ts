import type { BulletinAudience } from "./kinds";
import type { Role } from "@/permissions/roles";

export type AudienceCandidate = { userId: string; name: string | null; email: string; roles: readonly Role[] };
export type AudienceSpec = { audience: BulletinAudience; typeGroup: string | null };

/** A club member for bulletin purposes: a mechanic given records access only is not one. */
export function isClubMember(roles: readonly Role[]): boolean {
  return roles.some((r) => r !== "mechanic");
}

/**
 * Who a bulletin is addressed to, from the club's active memberships and standing checkouts:
 * everyone → every member; instructors → members holding the instructor role; a type group →
 * members with a standing (not revoked) checkout in that group. Type groups compare without
 * regard to case or surrounding spaces, as people type them.
 */
export function resolveAudience<T extends AudienceCandidate>(
  candidates: readonly T[],
  checkouts: readonly { userId: string; typeGroup: string }[],
  spec: AudienceSpec,
): T[] {
  const members = candidates.filter((c) => isClubMember(c.roles));
  if (spec.audience === "everyone") return members;
  if (spec.audience === "instructors") return members.filter((c) => c.roles.includes("instructor"));
  const wanted = normalizeTypeGroup(spec.typeGroup ?? "");
  if (!wanted) return [];
  const checkedOut = new Set(checkouts.filter((c) => normalizeTypeGroup(c.typeGroup) === wanted).map((c) => c.userId));
  return members.filter((c) => checkedOut.has(c.userId));
}

export function isInAudience(
  person: { userId: string; roles: readonly Role[] },
  checkouts: readonly { userId: string; typeGroup: string }[],
  spec: AudienceSpec,
): boolean {
  return resolveAudience([{ ...person, name: null, email: "" }], checkouts, spec).length === 1;
}

export function normalizeTypeGroup(value: string): string {
  return value.trim().replace(/\s+/g, " ").toLowerCase();
}
