import { describe, expect, it } from "vitest";
import { passwordSignInSchema, newPasswordSchema, safeCallbackUrl, acceptInvitationSchema } from "@/lib/validation/auth";
import { createClubSchema, slugSchema } from "@/lib/validation/clubs";
import { clubSettingsSchema, defaultClubSettings } from "@/lib/validation/club-settings";
import { changeRolesSchema, inviteMemberSchema } from "@/lib/validation/members";

describe("sign-in and invitation schemas", () => {
  it("normalises the e-mail and rejects a malformed one with a specific message", () => {
    expect(passwordSignInSchema.parse({ email: "  Pilot@Example.TEST ", password: "x" }).email).toBe("pilot@example.test");
    const bad = passwordSignInSchema.safeParse({ email: "pilot at example", password: "" });
    expect(bad.success).toBe(false);
    const messages = bad.error!.issues.map((i) => i.message);
    expect(messages).toContain("Enter a valid e-mail address, like name@example.com.");
    expect(messages).toContain("Enter your password.");
  });

  it("asks for a password of at least 10 characters", () => {
    expect(newPasswordSchema.safeParse("short").success).toBe(false);
    expect(newPasswordSchema.safeParse("long-enough-pass").success).toBe(true);
  });

  it("accepts an invitation token and rejects a stub", () => {
    expect(acceptInvitationSchema.safeParse({ token: "a".repeat(43) }).success).toBe(true);
    expect(acceptInvitationSchema.safeParse({ token: "abc" }).success).toBe(false);
  });

  it("follows only same-site paths after sign-in", () => {
    expect(safeCallbackUrl("/clubs/x")).toBe("/clubs/x");
    expect(safeCallbackUrl("https://elsewhere.test/")).toBe("/");
    expect(safeCallbackUrl("//elsewhere.test")).toBe("/");
    expect(safeCallbackUrl("/\\elsewhere.test")).toBe("/");
    expect(safeCallbackUrl(undefined)).toBe("/");
  });
});

describe("member schemas", () => {
  it("takes one role or several, de-duplicated", () => {
    expect(inviteMemberSchema.parse({ email: "a@b.test", roles: "member" }).roles).toEqual(["member"]);
    expect(inviteMemberSchema.parse({ email: "a@b.test", roles: ["member", "safety", "member"] }).roles).toEqual(["member", "safety"]);
  });

  it("refuses unknown roles, no roles, and a mechanic with club roles", () => {
    expect(inviteMemberSchema.safeParse({ email: "a@b.test", roles: ["captain"] }).success).toBe(false);
    expect(changeRolesSchema.safeParse({ membershipId: "m1", roles: [] }).success).toBe(false);
    const mixed = changeRolesSchema.safeParse({ membershipId: "m1", roles: ["mechanic", "admin"] });
    expect(mixed.success).toBe(false);
    expect(mixed.error!.issues[0]!.message).toMatch(/mechanic/);
  });
});

describe("club schemas", () => {
  const good = { name: "Juniper Ridge Flyers", slug: "juniper-ridge", timeZone: "America/Denver", currency: "USD", unitSystem: "imperial", adminEmail: "boss@example.test" };

  it("accepts a complete club", () => {
    expect(createClubSchema.parse(good)).toMatchObject({ slug: "juniper-ridge", currency: "USD" });
  });

  it("rejects bad slugs, time zones, currencies and units with specific messages", () => {
    expect(slugSchema.safeParse("Has Spaces").success).toBe(false);
    expect(slugSchema.safeParse("ab").success).toBe(false);
    expect(slugSchema.safeParse("operator").success).toBe(false);
    expect(slugSchema.safeParse("double--hyphen").success).toBe(false);
    const r = createClubSchema.safeParse({ ...good, timeZone: "Mars/Olympus", currency: "XYZ", unitSystem: "cubits" });
    expect(r.success).toBe(false);
    const byField = Object.fromEntries(r.error!.issues.map((i) => [i.path.join("."), i.message]));
    expect(byField.timeZone).toMatch(/time zone/);
    expect(byField.currency).toMatch(/currency/);
    expect(byField.unitSystem).toMatch(/units/);
  });

  it("fills club settings with defaults and rejects out-of-range values", () => {
    const s = defaultClubSettings();
    expect(s.bookingGuards.grounded).toBe("refuse");
    expect(s.dueSoonDays).toBe(30);
    expect(clubSettingsSchema.safeParse({ dueSoonDays: -1 }).success).toBe(false);
    expect(clubSettingsSchema.safeParse({ bookingGuards: { inArrears: "maybe" } }).success).toBe(false);
  });
});
