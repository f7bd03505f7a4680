// What the booking page says beside an aircraft whose status stops or questions a booking.
// Grounded: no "Book" links; the status word and every grounding reason in words instead.
// Status unknown: the links stay (the booking guards decide), but the page says the status is
// unknown and names the missing record, so nobody reads the free time as "flyable".

import type { AircraftStatus, StatusReason } from "@/lib/airworthiness";

export type ScheduleStatusNote = {
  status: "grounded" | "unknown";
  /** False: the page offers no "Book" link for this aircraft. */
  bookable: boolean;
  /** The reasons in words, worst first. */
  reasons: string[];
  /** One sentence for the page: the status word, the reasons, what happens next. */
  text: string;
};

/** Reason codes that leave the status unknown (a missing record, an untriaged squawk, an error). */
const UNKNOWN_CODES = new Set(["no-completion", "hours-unknown", "expiry-unknown", "use-unknown", "other-meter", "squawk-untriaged", "status-error"]);

function sentence(texts: string[]): string {
  return texts.map((t) => t.trim().replace(/[.;\s]+$/, "")).join("; ");
}

/** Null when the status neither stops nor questions a booking (flyable, flyable with limits). */
export function scheduleStatusNote(status: AircraftStatus, reasons: StatusReason[]): ScheduleStatusNote | null {
  if (status === "grounded") {
    const texts = reasons.filter((r) => r.grounding).map((r) => r.text);
    const why = texts.length ? sentence(texts) : "no grounding reason was given with the status";
    return { status, bookable: false, reasons: texts, text: `Grounded — ${why}. Booking opens when maintenance returns it to service.` };
  }
  if (status === "unknown") {
    const texts = reasons.filter((r) => !r.grounding && UNKNOWN_CODES.has(r.code)).map((r) => r.text);
    const why = texts.length ? sentence(texts) : "missing record: the records this status is computed from";
    return { status, bookable: true, reasons: texts, text: `Status unknown — ${why}. Until it is recorded, check the aircraft's records with maintenance before you fly.` };
  }
  return null;
}
