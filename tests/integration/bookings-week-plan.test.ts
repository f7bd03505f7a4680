import { describe, expect, it } from "vitest";
import { sheetBookingsQuery } from "@/db/queries/bookings";
import { clubs } from "@/db/schema";
import { defaultClubSettings } from "@/lib/validation/club-settings";
import { db } from "./helpers";

// The week view reads one club's bookings in a time window: through the (club_id, starts_at)
// index, never a scan of every booking (100,000 of them in the benchmark).
describe("week view query plan", () => {
  it("searches bookings by club and start time", () => {
    const [club] = db().insert(clubs).values({ slug: "plan-club", name: "Plan Club", timeZone: "America/Chicago", currency: "USD", unitSystem: "imperial", settings: defaultClubSettings() }).returning().all();
    const from = new Date("2026-03-02T06:00:00Z");
    const to = new Date("2026-03-09T06:00:00Z");
    const q = sheetBookingsQuery(db(), club!.id, from, to).toSQL();
    const plan = db().$client.prepare(`EXPLAIN QUERY PLAN ${q.sql}`).all(...q.params.map((p) => (p instanceof Date ? p.getTime() : p))) as { detail: string }[];
    const details = plan.map((r) => r.detail);
    expect(details.some((d) => /^SEARCH bookings USING INDEX bookings_club_time \(club_id=\? AND starts_at>\? AND starts_at<\?\)/.test(d)), details.join("\n")).toBe(true);
    expect(details.some((d) => /^SCAN bookings\b/.test(d)), details.join("\n")).toBe(false);
  });
});
