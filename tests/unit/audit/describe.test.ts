import { describe, expect, it } from "vitest";
import { describeAuditEntry, formatAuditTime } from "@/lib/audit/describe";

const words = { timeZone: "America/Chicago", currency: "USD", names: new Map([["m-000000001", "Rowan Pike"], ["a-000000001", "N0123X"]]) };

describe("an audit entry in words", () => {
  it("says who did what to whom, and each change from → to", () => {
    const d = describeAuditEntry(
      { action: "member.roles.change", subjectType: "Membership", subjectId: "m-000000001", before: { roles: ["member"] }, after: { roles: ["member", "instructor"] }, actorName: "Abena Carrow", createdAt: new Date("2026-12-02T15:14:00Z") },
      words,
    );
    expect(d.sentence).toBe("Abena Carrow changed a member's roles (Rowan Pike).");
    expect(d.details).toEqual(["roles: member → member, instructor"]);
    // 15:14 UTC is 09:14 in Chicago in December (UTC−6, IANA tz database).
    expect(d.when).toBe("Wed, 2 Dec 2026, 09:14 GMT-6");
  });

  it("names ids it knows, leaves out ids it does not, and reads money and instants in the club's terms", () => {
    const d = describeAuditEntry(
      { action: "money.payment.manual", subjectType: "Payment", subjectId: "p-1", before: null, after: { amountMinor: 12345, entryId: "e-000000009", aircraftId: "a-000000001", receivedAt: "2026-07-04T17:00:00.000Z" }, actorName: null, createdAt: new Date("2026-07-04T17:00:00Z") },
      words,
    );
    expect(d.sentence).toBe("The system recorded a payment.");
    // 17:00 UTC is 12:00 in Chicago in July (UTC−5, IANA tz database).
    expect(d.details).toEqual(["amount: $123.45", "aircraft id: N0123X", "received at: Sat, 4 Jul 2026, 12:00 GMT-5"]);
  });

  it("a recurring bill the scheduled run entered names no person, and who set the recurring bill up", () => {
    const d = describeAuditEntry(
      { action: "money.bill.enter.scheduled", subjectType: "Bill", subjectId: "b-1", before: null, after: { billId: "b-000000001", vendor: "Cove Hangar Trust", billDate: "2026-11-01", periodKey: "2026-11", amountMinor: 45000, status: "approved", recurring: true, setUpBy: "m-000000001" }, actorName: null, createdAt: new Date("2026-11-01T12:00:00Z") },
      words,
    );
    expect(d.sentence).toBe("The scheduled run (no person) entered a recurring bill that fell due.");
    expect(d.details).toEqual(["vendor: Cove Hangar Trust", "bill date: 2026-11-01", "period key: 2026-11", "amount: $450.00", "status: approved", "recurring: yes", "set up by: Rowan Pike"]);
  });

  it("an action without its own words is still read from its name", () => {
    const d = describeAuditEntry({ action: "money.widget.frob", subjectType: "X", subjectId: "x", before: null, after: null, actorName: "A", createdAt: new Date(0) }, words);
    expect(d.sentence).toBe("A made a change: money, widget, frob.");
    expect(formatAuditTime(new Date(0), "UTC")).toBe("Thu, 1 Jan 1970, 00:00 UTC");
  });
});
