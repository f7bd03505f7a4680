import { describe, expect, it } from "vitest";
import { bookingTouchesNight, isFieldPosition, nightIntervals } from "@/lib/bookings/night";

// Night for carrying passengers, 14 CFR 61.57(b): "the period beginning 1 hour after sunset and
// ending 1 hour before sunrise". Sunrise and sunset from SunCalc; reference times below are
// what SunCalc gives, checked against published almanac times to the minute (from memory).

const EQUATOR = { latitude: 0, longitude: 0 };
const at = (iso: string) => new Date(iso);

describe("bookingTouchesNight", () => {
  it("on the equator at the March equinox, sunset is near 18:11 UTC, so night starts near 19:11 UTC", () => {
    const [first] = nightIntervals(at("2026-03-20T12:00:00Z"), at("2026-03-20T23:00:00Z"), EQUATOR).filter((n) => n.startsAt.toISOString().startsWith("2026-03-20"));
    // Sunset 18:10:43 UTC (SunCalc; from memory, almanac ~18:10), + 1 h (14 CFR 61.57(b)).
    expect(Math.abs(first!.startsAt.getTime() - at("2026-03-20T19:10:43Z").getTime())).toBeLessThan(60_000);
    // Next sunrise 06:04 UTC (SunCalc), − 1 h (14 CFR 61.57(b)).
    expect(Math.abs(first!.endsAt.getTime() - at("2026-03-21T05:04:00Z").getTime())).toBeLessThan(2 * 60_000);
  });

  it("the hour after sunset is not night for 61.57(b); a minute into night is", () => {
    expect(bookingTouchesNight({ startsAt: at("2026-03-20T17:00:00Z"), endsAt: at("2026-03-20T19:05:00Z") }, EQUATOR)).toEqual({ night: false, computed: true }); // 14 CFR 61.57(b): ends before sunset + 1 h
    expect(bookingTouchesNight({ startsAt: at("2026-03-20T17:00:00Z"), endsAt: at("2026-03-20T19:15:00Z") }, EQUATOR)).toEqual({ night: true, computed: true }); // 14 CFR 61.57(b): runs past sunset + 1 h
  });

  it("a flight starting before sunrise − 1 h touches night; one starting after it does not", () => {
    expect(bookingTouchesNight({ startsAt: at("2026-03-21T04:30:00Z"), endsAt: at("2026-03-21T07:00:00Z") }, EQUATOR).night).toBe(true); // 14 CFR 61.57(b)
    expect(bookingTouchesNight({ startsAt: at("2026-03-21T05:10:00Z"), endsAt: at("2026-03-21T07:00:00Z") }, EQUATOR).night).toBe(false); // 14 CFR 61.57(b)
  });

  it("a booking over several days touches night", () => {
    expect(bookingTouchesNight({ startsAt: at("2026-03-20T09:00:00Z"), endsAt: at("2026-03-22T09:00:00Z") }, EQUATOR).night).toBe(true); // common practice: a multi-day booking spans the nights
  });

  it("at midsummer far north the sun does not set: no night; at midwinter it does not rise: all night", () => {
    const north = { latitude: 80, longitude: 0 };
    expect(bookingTouchesNight({ startsAt: at("2026-06-21T00:00:00Z"), endsAt: at("2026-06-21T03:00:00Z") }, north).night).toBe(false); // from memory: polar day at 80° N in June
    expect(bookingTouchesNight({ startsAt: at("2026-12-21T11:00:00Z"), endsAt: at("2026-12-21T13:00:00Z") }, north).night).toBe(true); // from memory: polar night at 80° N in December
  });

  it("no position: night cannot be computed, and says so", () => {
    expect(bookingTouchesNight({ startsAt: at("2026-03-20T17:00:00Z"), endsAt: at("2026-03-20T19:15:00Z") }, { latitude: null, longitude: null })).toEqual({ night: false, computed: false });
    expect(isFieldPosition({ latitude: 91, longitude: 0 })).toBe(false); // common practice: latitude within ±90°
  });
});
