import { describe, expect, it } from "vitest";
import { summarizeCurrency, type CurrencyInput } from "@/lib/safety/currency-summary";

// Claims are not proof: items count verified records only and show the member's own claims
// beside. Passenger currency is listed per category and class the club flies (14 CFR 61.57(a)).

const TODAY = "2026-06-30";
const SEL = { category: "Airplane", classRating: "Single-engine land" };

function input(over: Partial<CurrencyInput> = {}): CurrencyInput {
  return {
    landings: [], typeFlights: [], lastFlightReview: null, medicalExpiresOn: null, checkoutTypeGroups: [],
    recencyDaysInType: 60, documentWarnDays: 30, today: TODAY, classes: [SEL, { ...SEL, tailwheel: true }], ...over,
  };
}
const item = (out: ReturnType<typeof summarizeCurrency>, key: string) => out.items.find((i) => i.key === key)!;

describe("summarizeCurrency with claims and classes", () => {
  it("one day and one night line per class the club flies", () => {
    const keys = summarizeCurrency(input()).items.map((i) => i.key);
    expect(keys).toEqual([
      "passenger_day:airplane/singleengineland", "passenger_night:airplane/singleengineland",
      "passenger_day:airplane/singleengineland/tailwheel", "passenger_night:airplane/singleengineland/tailwheel",
      "flight_review", "medical",
    ]);
  });

  it("claimed landings are shown as a claim and do not count", () => {
    const out = summarizeCurrency(input({ landings: [{ date: "2026-06-20", dayLandings: 3, nightFullStopLandings: 3, ...SEL, claimed: true }] }));
    // 14 CFR 61.57(a),(b): 2026-06-20 + 89 days = 2026-09-17, but only as a claim.
    expect(item(out, "passenger_night:airplane/singleengineland")).toEqual({
      key: "passenger_night:airplane/singleengineland", label: "Passengers at night — Airplane single-engine land", state: "missing", lastDay: null,
      claim: { state: "current", lastDay: "2026-09-17" },
    });
  });

  it("a claimed flight review or medical is shown beside the verified one, which alone counts", () => {
    const out = summarizeCurrency(input({ lastFlightReview: "2024-01-10", claimedFlightReview: "2026-05-02", medicalExpiresOn: null, claimedMedicalExpiresOn: "2029-05-31" }));
    // 14 CFR 61.56(c): a review in January 2024 covers through 2026-01-31; May 2026 → 2028-05-31.
    expect(item(out, "flight_review")).toMatchObject({ state: "expired", lastDay: "2026-01-31", claim: { state: "current", lastDay: "2028-05-31" } });
    expect(item(out, "medical")).toMatchObject({ state: "missing", lastDay: null, claim: { state: "current", lastDay: "2029-05-31" } });
  });

  it("verified records carry no claim note", () => {
    const out = summarizeCurrency(input({ lastFlightReview: "2026-05-02" }));
    expect(item(out, "flight_review")).toEqual({ key: "flight_review", label: "Flight review", state: "current", lastDay: "2028-05-31" }); // 14 CFR 61.56(c)
  });
});
