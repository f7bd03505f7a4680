import { describe, expect, it } from "vitest";
import { RECENCY_WARN_DAYS, summarizeCurrency, type CurrencyInput } from "@/lib/safety/currency-summary";

// Counting convention as in lib/currency (day of the landings is day 1 of the 90, 14 CFR
// 61.57 leaves it open): landings on D count through D + 89. Expected dates are own arithmetic.
const base: CurrencyInput = {
  landings: [
    { date: "2025-05-01", dayLandings: 3, nightFullStopLandings: 0 },
    { date: "2025-03-01", dayLandings: 0, nightFullStopLandings: 3 },
  ],
  typeFlights: [{ date: "2025-05-20", typeGroup: "Fernwhistle F160" }],
  lastFlightReview: "2023-06-10",
  medicalExpiresOn: "2027-06-30",
  checkoutTypeGroups: ["Fernwhistle F160", "fernwhistle f160", "Larkspur L-2"],
  recencyDaysInType: 60, // a club setting stricter than the regulations
  documentWarnDays: 30,
  today: "2025-06-15",
};

describe("summarizeCurrency — one member's currency from lib/currency", () => {
  const { items, next, attention } = summarizeCurrency(base);
  const item = (key: string) => items.find((i) => i.key === key)!;

  it("passenger currency by day: 3 landings on 2025-05-01 last through 2025-07-29 (14 CFR 61.57(a))", () => {
    expect(item("passenger_day")).toMatchObject({ state: "current", lastDay: "2025-07-29" });
  });

  it("night: 3 full-stop night landings on 2025-03-01 lapsed after 2025-05-29 (14 CFR 61.57(b))", () => {
    expect(item("passenger_night")).toMatchObject({ state: "expired", lastDay: "2025-05-29" });
  });

  it("flight review of 2023-06-10 runs to 2025-06-30 and is inside the 30-day warning (14 CFR 61.56(c); club setting)", () => {
    expect(item("flight_review")).toMatchObject({ state: "expiring", lastDay: "2025-06-30" });
  });

  it("medical shows its expiry date only", () => {
    expect(item("medical")).toEqual({ key: "medical", label: "Medical", state: "current", lastDay: "2027-06-30" });
  });

  it("recency per checked-out type group, each group once: Fernwhistle flown 2025-05-20 counts through 2025-07-18 on a 60-day rule (club setting)", () => {
    expect(item("recency:fernwhistle f160")).toMatchObject({ state: "current", lastDay: "2025-07-18", label: "Recency in Fernwhistle F160" });
    expect(item("recency:larkspur l-2")).toMatchObject({ state: "missing", lastDay: null });
    expect(items.filter((i) => i.key.startsWith("recency:"))).toHaveLength(2);
  });

  it("names what ends next and counts what needs attention", () => {
    expect(next).toMatchObject({ key: "flight_review", lastDay: "2025-06-30" });
    expect(attention).toBe(3); // night lapsed, review ending, Larkspur recency not on record
  });

  it("flags landing currency in its last 14 days (our choice) and says 'not on record' with nothing logged", () => {
    expect(RECENCY_WARN_DAYS).toBe(14);
    // 2025-07-29 − 14 days = 2025-07-15 (own arithmetic)
    const late = summarizeCurrency({ ...base, today: "2025-07-15" }).items.find((i) => i.key === "passenger_day")!;
    expect(late.state).toBe("expiring");
    const early = summarizeCurrency({ ...base, today: "2025-07-14" }).items.find((i) => i.key === "passenger_day")!;
    expect(early.state).toBe("current");
    const empty = summarizeCurrency({ ...base, landings: [], lastFlightReview: null, medicalExpiresOn: null, checkoutTypeGroups: [] });
    expect(empty.items.map((i) => i.state)).toEqual(["missing", "missing", "missing", "missing"]);
    expect(empty.next).toBeNull();
  });
});
