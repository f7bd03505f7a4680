import { getDb } from "@/db/client";

export const dynamic = "force-dynamic";

/**
 * For the load balancer or process supervisor in front of the app: 200 when the server answers and
 * its database reads, 503 when it does not. No session and nothing about any club; it is also the
 * benchmark's measure of what the framework alone costs a route handler (`npm run bench:http`).
 */
export function GET() {
  try {
    getDb().$client.prepare("SELECT 1").pluck().get();
    return new Response('{"status":"ok"}', { headers: { "Content-Type": "application/json", "Cache-Control": "no-store" } });
  } catch {
    return new Response('{"status":"unavailable"}', { status: 503, headers: { "Content-Type": "application/json", "Cache-Control": "no-store" } });
  }
}
