import { describe, expect, it } from "vitest";
import { canReadReport, canTriageReports } from "@/lib/safety/report-access";
import { medicalViewFor } from "@/lib/safety/medical-view";
import { defineAbilityFor } from "@/permissions";

const me = "user-me";
const other = "user-other";
const ability = (roles: Parameters<typeof defineAbilityFor>[0]["roles"], userId = me) => defineAbilityFor({ userId, roles });

describe("who reads a safety report", () => {
  const named = { reporterId: me };
  const anonymous = { reporterId: null };
  it("the safety officer reads every report", () => {
    expect(canReadReport(ability(["member", "safety"], other), named)).toBe(true);
    expect(canReadReport(ability(["member", "safety"], other), anonymous)).toBe(true);
    expect(canTriageReports(ability(["member", "safety"]))).toBe(true);
  });
  it("a reporter reads their own named report only; nobody's link matches an anonymous one", () => {
    expect(canReadReport(ability(["member"]), named)).toBe(true);
    expect(canReadReport(ability(["member"], other), named)).toBe(false);
    expect(canReadReport(ability(["member"]), anonymous)).toBe(false);
  });
  it("club admins do not read reports", () => {
    expect(canReadReport(ability(["member", "admin"], other), named)).toBe(false);
    expect(canReadReport(ability(["member", "admin"]), anonymous)).toBe(false);
    expect(canTriageReports(ability(["member", "admin"]))).toBe(false);
  });
});

describe("what a viewer sees of a medical", () => {
  const record = { kind: "faa_class" as const, medicalClass: 2, examDate: "2025-01-10", courseDate: null, limitations: "Corrective lenses", expiresOn: "2027-01-31" };
  it("the member and club admins see the details", () => {
    expect(medicalViewFor(ability(["member"]), me, record)).toMatchObject({ level: "full", medicalClass: 2, limitations: "Corrective lenses" });
    expect(medicalViewFor(ability(["member", "admin"], other), me, record)).toMatchObject({ level: "full", examDate: "2025-01-10" });
  });
  it("the safety officer and instructors see the expiry date only", () => {
    expect(medicalViewFor(ability(["member", "safety"], other), me, record)).toEqual({ level: "expiry", expiresOn: "2027-01-31" });
    expect(medicalViewFor(ability(["member", "instructor"], other), me, record)).toEqual({ level: "expiry", expiresOn: "2027-01-31" });
  });
  it("another member sees nothing", () => {
    expect(medicalViewFor(ability(["member"], other), me, record)).toBeNull();
    expect(medicalViewFor(ability(["mechanic"], other), me, record)).toBeNull();
  });
});
