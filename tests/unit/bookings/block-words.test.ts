import { describe, expect, it } from "vitest";
import { blockWords } from "@/lib/bookings/block-words";

// Club clocks from the IANA time zone database: America/Chicago is UTC−6 in December (CST),
// Europe/Berlin UTC+1 (CET).
describe("a maintenance block in words on the club's clock", () => {
  it("a block within one club day gives the day and two clock times", () => {
    expect(blockWords({ startsAt: "2026-12-02T19:00:00Z", endsAt: "2026-12-02T23:00:00Z", reason: "100-hour inspection" }, "America/Chicago")).toBe(
      "Maintenance block Wed 2 Dec 2026, 13:00–17:00: 100-hour inspection", // 19:00Z − 6 h = 13:00 CST (IANA tz database)
    );
  });

  it("an evening block in the United States stays on its own club day, not the next UTC day", () => {
    expect(blockWords({ startsAt: "2026-12-03T01:00:00Z", endsAt: "2026-12-03T03:30:00Z", reason: "Oil change" }, "America/Chicago")).toBe(
      "Maintenance block Wed 2 Dec 2026, 19:00–21:30: Oil change", // 01:00Z on the 3rd is 19:00 CST on the 2nd (IANA tz database)
    );
  });

  it("a block ending at the club's midnight ends at 24:00 of its day", () => {
    expect(blockWords({ startsAt: "2026-12-02T08:00:00Z", endsAt: "2026-12-02T23:00:00Z", reason: "Annual" }, "Europe/Berlin")).toBe(
      "Maintenance block Wed 2 Dec 2026, 09:00–24:00: Annual", // CET = UTC+1 (IANA tz database); 24:00 for the end of a day, ISO 8601
    );
  });

  it("a block over several days gives both ends in full", () => {
    expect(blockWords({ startsAt: "2026-12-02T14:00:00Z", endsAt: "2026-12-04T18:00:00Z", reason: "Annual inspection" }, "America/Chicago")).toBe(
      "Maintenance block from Wed 2 Dec 2026, 08:00 to Fri 4 Dec 2026, 12:00: Annual inspection",
    );
  });
});
