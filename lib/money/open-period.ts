// Money that arrives, or a charge for a flight already flown, is never refused because its
// day sits inside a reconciled, locked period: it posts on the first open day after the lock,
// and its memo keeps the original date so an auditor can trace it (standard accounting
// practice: a closed period is never reopened; late items are booked in the current period).

import { addDays, type IsoDate } from "@/lib/dates";

export type OpenPostingDate = {
  /** The day the entry is dated in the journal. */
  postOn: IsoDate;
  /** The day the money moved (or the flight was flown). */
  originalDate: IsoDate;
  /** True when postOn differs from originalDate because the original day is locked. */
  moved: boolean;
};

/** The first day on or after `date` that is not inside the locked period (`lockedThrough` inclusive). */
export function firstOpenDay(date: IsoDate, lockedThrough: IsoDate | null): OpenPostingDate {
  if (!lockedThrough || date > lockedThrough) return { postOn: date, originalDate: date, moved: false };
  return { postOn: addDays(lockedThrough, 1), originalDate: date, moved: true };
}

/** The note added to a moved entry's memo, naming the original date. */
export function lockedPeriodNote(posting: OpenPostingDate): string {
  return posting.moved ? ` (dated ${posting.originalDate}, in a locked period; posted on the first open day ${posting.postOn})` : "";
}
