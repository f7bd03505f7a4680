import { describe, expect, it } from "vitest";
import { documentsDueForReminder, latestByIssue } from "@/lib/safety/document-reminders";

describe("documentsDueForReminder — the club's documentReminderDays window", () => {
  const docs = [
    { id: "soon", expiresOn: "2026-01-30", reminderSentFor: null }, // 29 days after 2026-01-01
    { id: "edge", expiresOn: "2026-01-31", reminderSentFor: null }, // exactly 30 days: inside
    { id: "later", expiresOn: "2026-02-01", reminderSentFor: null }, // 31 days: not yet
    { id: "lapsed", expiresOn: "2025-12-20", reminderSentFor: null },
    { id: "done", expiresOn: "2026-01-15", reminderSentFor: "2026-01-15" }, // already reminded for this expiry
    { id: "renewed", expiresOn: "2026-01-20", reminderSentFor: "2025-01-20" }, // reminded for an older expiry
    { id: "none", expiresOn: null, reminderSentFor: null },
  ];

  it("picks documents ending within the window or lapsed, once per expiry date", () => {
    // Day counts are own arithmetic from 2026-01-01.
    expect(documentsDueForReminder(docs, "2026-01-01", 30).map((d) => d.id)).toEqual(["soon", "edge", "lapsed", "renewed"]);
  });

  it("a window of 0 reminds only on the last day and after", () => {
    expect(documentsDueForReminder(docs, "2026-01-30", 0).map((d) => d.id)).toEqual(["soon", "lapsed", "renewed"]);
  });
});

describe("latestByIssue", () => {
  it("takes the latest issued, then the latest recorded", () => {
    const a = { id: "a", issuedOn: "2025-01-01", createdAt: new Date("2025-01-02") };
    const b = { id: "b", issuedOn: "2025-06-01", createdAt: new Date("2025-06-02") };
    const c = { id: "c", issuedOn: "2025-06-01", createdAt: new Date("2025-06-05") };
    expect(latestByIssue([a, b, c])?.id).toBe("c");
    expect(latestByIssue([])).toBeNull();
  });
});
