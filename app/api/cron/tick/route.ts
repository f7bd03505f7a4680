import { createHash, timingSafeEqual } from "node:crypto";
import { NextResponse } from "next/server";
import { getDb } from "@/db/client";
import { produceScheduledBills } from "@/db/queries/money-recurring";
import { kickOutbox } from "@/lib/email/runner";
import { composeBookingReminders } from "@/lib/email/booking-reminders";
import { composeSafetyDigests } from "@/lib/email/safety-digest";
import { apiError } from "@/lib/server/api";

export const dynamic = "force-dynamic";

const digest = (value: string) => createHash("sha256").update(value).digest();

/**
 * The scheduled tick for deployments that run it from cron instead of the in-process timer:
 * `POST /api/cron/tick` with `Authorization: Bearer $CRON_SECRET`. Without a configured secret
 * the route does not exist. Calling it more often than needed is harmless: each batch is composed once,
 * and each recurring bill's period is billed once (`bills`: the clubs and bills entered by this call).
 */
export async function POST(request: Request) {
  const secret = process.env.CRON_SECRET;
  if (!secret) return apiError("not_found", "Not found.");
  const given = (request.headers.get("authorization") ?? "").replace(/^Bearer\s+/i, "");
  if (!given || !timingSafeEqual(digest(given), digest(secret))) return apiError("unauthenticated", "A valid scheduler token is required.");
  const result = composeSafetyDigests(getDb());
  const reminders = composeBookingReminders(getDb());
  const bills = produceScheduledBills(getDb());
  if (result.messages > 0 || reminders.messages > 0) kickOutbox();
  return NextResponse.json({ ok: true, digests: result, reminders, bills });
}
