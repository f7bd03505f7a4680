import { describe, expect, it } from "vitest";
import { isClubMember, isInAudience, normalizeTypeGroup, resolveAudience } from "@/lib/safety/audience";
import type { Role } from "@/permissions/roles";

const person = (userId: string, roles: Role[]) => ({ userId, name: userId, email: `${userId}@example.test`, roles });
const people = [
  person("ada", ["member"]),
  person("ben", ["member", "instructor"]),
  person("cal", ["member", "safety"]),
  person("mech", ["mechanic"]),
  person("dee", ["member"]),
];
const standing = [
  { userId: "ada", typeGroup: "Fernwhistle F160" },
  { userId: "ben", typeGroup: "Larkspur L-2" },
  { userId: "mech", typeGroup: "Fernwhistle F160" },
];

describe("resolveAudience — who a bulletin is addressed to", () => {
  it("everyone means every member, and a records-only mechanic is not a member", () => {
    expect(resolveAudience(people, standing, { audience: "everyone", typeGroup: null }).map((p) => p.userId)).toEqual(["ada", "ben", "cal", "dee"]);
    expect(isClubMember(["mechanic"])).toBe(false);
    expect(isClubMember(["member", "admin"])).toBe(true);
  });

  it("instructors means members holding the instructor role", () => {
    expect(resolveAudience(people, standing, { audience: "instructors", typeGroup: null }).map((p) => p.userId)).toEqual(["ben"]);
  });

  it("a type group means members with a standing checkout in it, matched without regard to case or spacing", () => {
    expect(resolveAudience(people, standing, { audience: "type_group", typeGroup: "Fernwhistle F160" }).map((p) => p.userId)).toEqual(["ada"]);
    expect(resolveAudience(people, standing, { audience: "type_group", typeGroup: "  fernwhistle   f160 " }).map((p) => p.userId)).toEqual(["ada"]);
    expect(resolveAudience(people, standing, { audience: "type_group", typeGroup: "Brightwing BW-4" })).toEqual([]);
    expect(resolveAudience(people, standing, { audience: "type_group", typeGroup: null })).toEqual([]);
  });

  it("answers for one person the same way", () => {
    expect(isInAudience({ userId: "ada", roles: ["member"] }, standing, { audience: "type_group", typeGroup: "Fernwhistle F160" })).toBe(true);
    expect(isInAudience({ userId: "dee", roles: ["member"] }, standing, { audience: "type_group", typeGroup: "Fernwhistle F160" })).toBe(false);
    expect(isInAudience({ userId: "mech", roles: ["mechanic"] }, standing, { audience: "everyone", typeGroup: null })).toBe(false);
    expect(normalizeTypeGroup(" Larkspur  L-2 ")).toBe("larkspur l-2");
  });
});
