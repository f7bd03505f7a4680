import { describe, expect, it } from "vitest";
import { passengerCurrency, recencyInType } from "@/lib/currency";

// Counting convention (our documented interpretation of "within the preceding 90 days",
// 14 CFR 61.57(a),(b), which does not say whether the day of the landings is day 1): the day
// of the landings is day 1, so landings on D keep the pilot current through D + 89 days.
// Every expected date below is our own arithmetic on that rule.

const day = (date: string, n: number) => ({ date, dayLandings: n, nightFullStopLandings: 0 });
const night = (date: string, n: number) => ({ date, dayLandings: 0, nightFullStopLandings: n });

describe("passengerCurrency — 14 CFR 61.57(a) day", () => {
  it("keeps exactly 3 landings current through day 90 of the window and not a day after", () => {
    const flights = [day("2025-01-01", 3)];
    // 14 CFR 61.57(a): 2025-01-01 + 89 days = 2025-03-31 (own arithmetic: 30 + 28 + 31)
    expect(passengerCurrency(flights, "2025-03-31").day).toEqual({ current: true, lastDay: "2025-03-31" });
    // 14 CFR 61.57(a): the 91st day is outside the preceding 90 days
    expect(passengerCurrency(flights, "2025-04-01").day).toEqual({ current: false, lastDay: "2025-03-31" });
  });

  it("is not current on 2 landings", () => {
    // 14 CFR 61.57(a): three takeoffs and landings are required
    expect(passengerCurrency([day("2025-01-01", 2)], "2025-01-02").day).toEqual({ current: false, lastDay: null });
    expect(passengerCurrency([day("2025-01-01", 1), day("2025-01-05", 1)], "2025-01-06").day.current).toBe(false);
  });

  it("counts full-stop night landings toward day currency", () => {
    // 14 CFR 61.57(a),(b): night landings also satisfy the day requirement
    const flights = [day("2025-05-01", 1), night("2025-05-02", 2)];
    expect(passengerCurrency(flights, "2025-05-10").day).toEqual({ current: true, lastDay: "2025-07-29" });
    // own arithmetic: 2025-05-01 + 89 days = 2025-07-29 (30 + 30 + 29)
  });

  it("takes the third most recent landing across several flights and days", () => {
    const flights = [day("2025-02-01", 1), day("2025-01-10", 1), day("2025-01-20", 1), day("2024-06-01", 4)];
    // 14 CFR 61.57(a): third most recent landing is 2025-01-10 → 2025-04-09 (own arithmetic)
    expect(passengerCurrency(flights, "2025-02-02").day).toEqual({ current: true, lastDay: "2025-04-09" });
  });

  it("counts many landings on one flight and several flights on one day", () => {
    // 14 CFR 61.57(a): five landings in one flight on 2025-02-01 → 2025-05-01 (own arithmetic)
    expect(passengerCurrency([day("2025-01-01", 1), day("2025-02-01", 5)], "2025-02-01").day.lastDay).toBe("2025-05-01");
    // two flights the same day add up: 2 + 1 landings on 2025-02-01
    const sameDay = [day("2025-02-01", 2), day("2025-02-01", 1), day("2024-12-01", 1)];
    expect(passengerCurrency(sameDay, "2025-03-01").day.lastDay).toBe("2025-05-01");
  });

  it("ignores flights after asOf", () => {
    const flights = [day("2025-01-01", 1), day("2025-03-01", 3)];
    // 14 CFR 61.57(a): "preceding" — the March landings have not happened yet on 2025-02-15
    expect(passengerCurrency(flights, "2025-02-15").day).toEqual({ current: false, lastDay: null });
    // own arithmetic: 2025-03-01 + 89 days = 2025-05-29
    expect(passengerCurrency(flights, "2025-03-01").day).toEqual({ current: true, lastDay: "2025-05-29" });
  });

  it("reports the lapsed last day once currency has run out", () => {
    // 14 CFR 61.57(a): 2024-06-01 + 89 days = 2024-08-29 (own arithmetic: 29 + 31 + 29)
    expect(passengerCurrency([day("2024-06-01", 3)], "2025-01-01").day).toEqual({ current: false, lastDay: "2024-08-29" });
  });

  it("counts across a leap day", () => {
    // 14 CFR 61.57(a): 2024-01-01 + 89 days = 2024-03-30 (2024 is a leap year, Gregorian rule)
    expect(passengerCurrency([day("2024-01-01", 3)], "2024-03-30").day).toEqual({ current: true, lastDay: "2024-03-30" });
  });

  it("returns never current for no flights", () => {
    expect(passengerCurrency([], "2025-01-01")).toEqual({
      day: { current: false, lastDay: null },
      night: { current: false, lastDay: null },
    });
  });

  it("refuses impossible inputs rather than guessing", () => {
    expect(() => passengerCurrency([day("2025-02-30", 3)], "2025-03-01")).toThrow(RangeError);
    expect(() => passengerCurrency([day("2025-01-01", -1)], "2025-03-01")).toThrow(RangeError);
    expect(() => passengerCurrency([day("2025-01-01", 1.5)], "2025-03-01")).toThrow(RangeError);
  });
});

describe("passengerCurrency — 14 CFR 61.57(b) night", () => {
  it("needs three full-stop landings at night; day landings do not count", () => {
    const flights = [day("2025-05-01", 5), night("2025-05-02", 2)];
    // 14 CFR 61.57(b): only 2 full-stop night landings
    expect(passengerCurrency(flights, "2025-05-03").night).toEqual({ current: false, lastDay: null });
  });

  it("is current through day 90 after the third night landing", () => {
    const flights = [night("2025-05-02", 2), night("2025-05-20", 1), day("2025-06-01", 3)];
    // 14 CFR 61.57(b): third most recent night landing is 2025-05-02 → 2025-07-30 (own arithmetic)
    const result = passengerCurrency(flights, "2025-07-30");
    expect(result.night).toEqual({ current: true, lastDay: "2025-07-30" });
    // 14 CFR 61.57(a): day currency rests on 2025-06-01 → 2025-08-29 (own arithmetic)
    expect(result.day).toEqual({ current: true, lastDay: "2025-08-29" });
    expect(passengerCurrency(flights, "2025-07-31").night.current).toBe(false);
  });
});

describe("recencyInType — club rule (stricter than regulation, club setting)", () => {
  it("keeps a 60-day rule with the same day-1 convention", () => {
    const flights = [{ date: "2025-03-01" }, { date: "2025-01-15" }, { date: "2025-06-01" }];
    // club rule, 60 days: 2025-03-01 + 59 days = 2025-04-29 (own arithmetic); June is after asOf
    expect(recencyInType(flights, "2025-04-29", 60)).toEqual({ current: true, lastFlown: "2025-03-01", lastDay: "2025-04-29" });
    expect(recencyInType(flights, "2025-04-30", 60).current).toBe(false);
  });

  it("is not current when the type was never flown", () => {
    expect(recencyInType([], "2025-04-30", 60)).toEqual({ current: false, lastFlown: null, lastDay: null });
    expect(() => recencyInType([], "2025-04-30", 0)).toThrow(RangeError);
  });
});
