// Reasons from open squawks and grounding notices.

import type { IsoDate } from "@/lib/dates";
import { formatInstantWords } from "@/lib/dates/words";
import { makeReason, type RankedReason } from "./reason";
import type { GroundingNotice, Squawk } from "./types";

function squawkReason(s: Squawk): RankedReason {
  const what = s.description.trim() || "(no description)";
  switch (s.triage) {
    case "grounding":
      return makeReason("grounded", "squawk-grounding", `Grounding squawk: ${what}`);
    case "deferred": {
      // 14 CFR 91.213(d)(3): without the placard (or removal) and deactivation, the aircraft
      // may not be operated with the item inoperative, so an unconfirmed deferral grounds.
      if (!s.placarded) {
        return makeReason(
          "grounded",
          "deferred-not-placarded",
          `Deferred squawk not confirmed deactivated and placarded inoperative (14 CFR 91.213(d)): ${what}`,
        );
      }
      const limitation = s.limitation?.trim() ? s.limitation.trim() : "no limitation recorded; ask maintenance";
      return makeReason(
        "limited",
        "deferred-item",
        `Deferred, placarded inoperative (14 CFR 91.213(d)): ${what}. Limitation: ${limitation}`,
      );
    }
    case "note":
      return makeReason("advisory", "squawk-note", `Open squawk (note): ${what}`);
    case "untriaged":
      // Nobody qualified has looked yet: never silently flyable. The reporter's own
      // "may affect airworthiness" is taken at its word until maintenance triages it.
      if (s.suspectedGrounding) {
        return makeReason(
          "grounded",
          "squawk-untriaged",
          `Squawk reported as affecting airworthiness, awaiting triage: ${what}`,
        );
      }
      return makeReason("unknown", "squawk-untriaged", `Squawk awaiting triage by maintenance: ${what}`);
  }
}

export function squawkReasons(squawks: Squawk[]): RankedReason[] {
  return squawks.filter((s) => s.open).map(squawkReason);
}

/** An unreadable instant counts as already effective: a notice must never be lost. */
function isEffective(notice: GroundingNotice, today: IsoDate, now: string | undefined): boolean {
  if (now !== undefined) {
    const effective = Date.parse(notice.effectiveAt);
    const current = Date.parse(now);
    if (Number.isNaN(effective) || Number.isNaN(current)) return true;
    return effective <= current;
  }
  return notice.effectiveAt.slice(0, 10) <= today;
}

/** The notice's instant on the club's clock ("Wed 2 Dec 2026, 20:25"); without the club's zone, in UTC and said so. */
function when(instant: string, timeZone: string | undefined): string {
  return timeZone ? formatInstantWords(instant, timeZone) : `${formatInstantWords(instant, "UTC")} UTC`;
}

export function noticeReasons(notices: GroundingNotice[], today: IsoDate, now?: string, timeZone?: string): RankedReason[] {
  return notices
    .filter((n) => !n.liftedAt)
    .map((n) => {
      const reason = n.reason.trim() || "(no reason given)";
      if (isEffective(n, today, now)) {
        return makeReason("grounded", "notice-active", `Grounding notice in effect since ${when(n.effectiveAt, timeZone)}: ${reason}`);
      }
      return makeReason("advisory", "notice-pending", `Grounding notice takes effect ${when(n.effectiveAt, timeZone)}: ${reason}`);
    });
}
