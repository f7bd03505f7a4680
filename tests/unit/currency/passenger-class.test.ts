import { describe, expect, it } from "vitest";
import { passengerCurrency, type LandingEntry } from "@/lib/currency";

// Passenger currency by category and class, and the tailwheel full-stop rule.
// 14 CFR 61.57(a)(1): "three takeoffs and three landings as the sole manipulator of the flight
// controls; (i) ... in an aircraft of the same category, class, and type (if a type rating is
// required), and (ii) if the aircraft is a tailwheel airplane, the landings must have been made
// to a full stop in a tailwheel airplane." 61.57(b): night, full stop, same category and class.

const SEL = { category: "Airplane", classRating: "Single-engine land" };
const MEL = { category: "Airplane", classRating: "Multiengine land" };
const HELI = { category: "Rotorcraft", classRating: "Helicopter" };
const ASOF = "2026-06-30";

const flight = (date: string, over: Partial<LandingEntry>): LandingEntry => ({ date, dayLandings: 0, nightFullStopLandings: 0, ...over });

describe("passengerCurrency by category and class (14 CFR 61.57(a)(1)(i))", () => {
  it("three landings in a helicopter or a twin do not make a single-engine pilot current", () => {
    const flights = [flight("2026-06-01", { ...HELI, dayLandings: 3 }), flight("2026-06-02", { ...MEL, dayLandings: 3, nightFullStopLandings: 3 })];
    const sel = passengerCurrency(flights, ASOF, SEL);
    expect(sel.day).toEqual({ current: false, lastDay: null }); // 14 CFR 61.57(a)(1)(i): same category and class
    expect(sel.night).toEqual({ current: false, lastDay: null }); // 14 CFR 61.57(b)(1)(ii): same category and class
    // In the twin itself the same flights count: 2026-06-02 + 89 days = 2026-08-30.
    expect(passengerCurrency(flights, ASOF, MEL).day).toEqual({ current: true, lastDay: "2026-08-30" }); // 14 CFR 61.57(a), 90 days
  });

  it("landings in the same class add up across flights; the third-newest landing sets the last day", () => {
    const flights = [flight("2026-05-01", { ...SEL, dayLandings: 1 }), flight("2026-05-10", { ...SEL, dayLandings: 2 }), flight("2026-05-20", { ...HELI, dayLandings: 5 })];
    // Three SEL landings, the oldest of them on 2026-05-01: current through 2026-07-29 (day 1 = 05-01).
    expect(passengerCurrency(flights, ASOF, SEL).day).toEqual({ current: true, lastDay: "2026-07-29" }); // 14 CFR 61.57(a): preceding 90 days
  });

  it("class words compare without regard to case, hyphens or spaces (common practice)", () => {
    const flights = [flight("2026-06-10", { category: "airplane", classRating: "single engine land", dayLandings: 3 })];
    expect(passengerCurrency(flights, ASOF, SEL).day.current).toBe(true); // common practice: same class however it is spelled
  });

  it("an entry with no category or class recorded does not count toward a specific class (our careful reading)", () => {
    const flights = [flight("2026-06-10", { dayLandings: 3, nightFullStopLandings: 3 })];
    expect(passengerCurrency(flights, ASOF, SEL)).toEqual({ day: { current: false, lastDay: null }, night: { current: false, lastDay: null } }); // 14 CFR 61.57(a)(1)(i): class unknown, not shown to be the same
    // Without a class asked for, the old class-blind count stands.
    expect(passengerCurrency(flights, ASOF).day).toEqual({ current: true, lastDay: "2026-09-07" }); // 14 CFR 61.57(a): 2026-06-10 + 89 days
  });

  it("night currency counts only full-stop night landings in the class (14 CFR 61.57(b))", () => {
    const flights = [flight("2026-06-05", { ...SEL, dayLandings: 4, nightFullStopLandings: 2 }), flight("2026-06-06", { ...MEL, nightFullStopLandings: 3 })];
    const out = passengerCurrency(flights, ASOF, SEL);
    expect(out.night).toEqual({ current: false, lastDay: null }); // 14 CFR 61.57(b): only 2 night full stops in SEL
    expect(out.day).toEqual({ current: true, lastDay: "2026-09-02" }); // 14 CFR 61.57(a): night landings count for day too; 06-05 + 89
  });
});

describe("tailwheel airplanes (14 CFR 61.57(a)(1)(ii))", () => {
  const TW = { ...SEL, tailwheel: true };

  it("only full-stop landings in a tailwheel airplane count", () => {
    const flights = [
      flight("2026-06-01", { ...SEL, tailwheel: false, dayLandings: 6, dayFullStopLandings: 6 }), // tricycle: never counts for tailwheel
      flight("2026-06-02", { ...SEL, tailwheel: true, dayLandings: 5, dayFullStopLandings: 2 }), // 3 touch-and-goes do not count
    ];
    expect(passengerCurrency(flights, ASOF, TW).day).toEqual({ current: false, lastDay: null }); // 14 CFR 61.57(a)(1)(ii): 2 full stops
    flights.push(flight("2026-06-03", { ...SEL, tailwheel: true, dayLandings: 1, dayFullStopLandings: 1 }));
    expect(passengerCurrency(flights, ASOF, TW).day).toEqual({ current: true, lastDay: "2026-08-30" }); // 14 CFR 61.57(a)(1)(ii): third full stop 06-02 + 89
  });

  it("a tailwheel flight whose full stops were not recorded counts no day landings (our careful reading); night full stops count", () => {
    const flights = [flight("2026-06-10", { ...SEL, tailwheel: true, dayLandings: 3, nightFullStopLandings: 3 })];
    const out = passengerCurrency(flights, ASOF, TW);
    expect(out.day).toEqual({ current: true, lastDay: "2026-09-07" }); // 14 CFR 61.57(a)(1)(ii): night landings are full stops; 06-10 + 89
    expect(passengerCurrency([flight("2026-06-10", { ...SEL, tailwheel: true, dayLandings: 3 })], ASOF, TW).day.current).toBe(false); // from memory: a touch-and-go is no full stop
  });

  it("night in a tailwheel airplane counts night full stops made in a tailwheel airplane", () => {
    const flights = [flight("2026-06-10", { ...SEL, tailwheel: false, nightFullStopLandings: 3 })];
    expect(passengerCurrency(flights, ASOF, TW).night.current).toBe(false); // 14 CFR 61.57(a)(1)(ii) with 61.57(b): our stricter reading
    expect(passengerCurrency(flights, ASOF, SEL).night).toEqual({ current: true, lastDay: "2026-09-07" }); // 14 CFR 61.57(b): tricycle of the class
  });

  it("tailwheel landings count toward a tricycle airplane of the same class", () => {
    const flights = [flight("2026-06-10", { ...SEL, tailwheel: true, dayLandings: 3 })];
    expect(passengerCurrency(flights, ASOF, SEL).day).toEqual({ current: true, lastDay: "2026-09-07" }); // 14 CFR 61.57(a)(1)(i): same category and class
  });

  it("refuses a full-stop count larger than the landings (bad record)", () => {
    expect(() => passengerCurrency([flight("2026-06-10", { ...TW, dayLandings: 1, dayFullStopLandings: 2 })], ASOF, TW)).toThrow(RangeError); // common practice: a part cannot exceed the whole
  });
});
