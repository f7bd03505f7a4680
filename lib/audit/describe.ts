// An audit entry in words: "Abena Carrow changed a member's roles (Rowan Pike): roles from member
// to member, instructor." Pure: the page (and its tests) pass the names the entry's ids stand for.

export type AuditEntryInput = {
  action: string;
  subjectType: string;
  subjectId: string;
  before: unknown;
  after: unknown;
  actorName: string | null;
  createdAt: Date;
};

export type AuditWords = {
  timeZone: string;
  currency: string;
  /** Record id → what people call it (a member's name, an aircraft's registration). */
  names?: ReadonlyMap<string, string>;
};

export type DescribedAuditEntry = { when: string; sentence: string; details: string[] };

// What each kind of change says after the person's name. An action not listed here is read from
// its own words ("money.bill.pay" → "made a change: money, bill, pay").
const VERBS: Record<string, string> = {
  "club.create": "created the club",
  "club.settings.update": "changed the club settings",
  "club.admin.assign": "appointed a club admin",
  "member.invite": "invited someone to the club",
  "member.invitation.revoke": "withdrew an invitation",
  "member.join": "joined the club",
  "member.roles.change": "changed a member's roles",
  "member.deactivate": "deactivated a member",
  "member.reactivate": "reactivated a member",
  "aircraft.create": "added an aircraft",
  "aircraft.update": "changed an aircraft's details",
  "aircraft.meter.switch": "switched the meter an aircraft's inspections count by",
  "aircraft.meter.lower": "lowered an aircraft's meter reading",
  "inspection.item.create": "added an inspection item",
  "inspection.item.update": "changed an inspection item",
  "inspection.record": "recorded an inspection",
  "inspection.meter.convert": "recorded an inspection's reading on the new meter",
  "squawk.triage": "triaged a squawk",
  "squawk.close": "closed a squawk",
  "grounding.issue": "issued a grounding notice",
  "grounding.lift": "lifted a grounding notice",
  "flight.meter.review": "reviewed a flight's meter readings",
  "flight.meter.settle": "settled a meter gap on a flight",
  "money.billing.run": "ran billing",
  "money.plan.save": "saved a dues plan",
  "money.plan.assign": "changed a member's dues plan",
  "money.payment.manual": "recorded a payment",
  "money.payment.refund": "refunded a payment",
  "money.entry.adjust": "posted an adjustment",
  "money.entry.reverse": "reversed a journal entry",
  "money.bank.import": "imported a bank statement",
  "money.bank.match": "matched bank lines with the books",
  "money.bank.unmatch": "undid a bank match",
  "money.bank.ignore": "changed whether a bank line is ignored",
  "money.bank.book": "booked a bank line",
  "money.period.lock": "locked a period of the books",
  "money.rates.save": "saved aircraft rates",
  "money.settings.save": "changed the money settings",
  "money.reminders.send": "sent payment reminders",
  "money.statement.email": "e-mailed a statement",
  "money.bill.enter": "entered a bill",
  "money.bill.enter.scheduled": "entered a recurring bill that fell due",
  "money.bill.approve": "approved a bill",
  "money.bill.pay": "paid a bill",
  "money.bill.approval-amount": "changed the amount above which bills need a second officer",
  "money.chart.create": "added an account to the chart of accounts",
  "money.chart.delete": "removed an account from the chart of accounts",
  "bulletin.create": "wrote a bulletin",
  "bulletin.draft.update": "changed a bulletin draft",
  "bulletin.publish": "published a bulletin",
  "bulletin.remind": "reminded members to read a bulletin",
  "safety_report.triage": "moved a safety report on",
  "safety_report.grounding": "grounded an aircraft from a safety report",
  "member_document.record": "recorded a member document",
  "member_document.remind": "sent document reminders",
  "medical.record": "recorded a medical",
  "currency.verify": "verified a currency record",
  "checkout.record": "recorded a checkout",
  "checkout.revoke": "withdrew a checkout",
  "booking.create": "made a booking",
  "booking.change": "changed a booking",
  "booking.cancel": "cancelled a booking",
  "booking.flight.begin": "began a flight on a booking",
  "booking.flight.close": "closed a flight sheet",
  // Entries written before the flight's life had its own words.
  "booking.dispatch": "began a flight on a booking",
  "booking.checkin": "closed a flight sheet",
  "calendar.link.create": "made a calendar link",
  "calendar.link.rotate": "replaced their calendar link",
  "calendar.link.revoke": "turned off their calendar link",
  "weight-balance.profile.update": "changed an aircraft's weight and balance",
  "preflight.template.update": "changed an aircraft's preflight checklist",
  "preflight.record": "recorded a preflight",
};

// Who did it when no person did (no actor): the work the schedule does by itself says so.
const NO_PERSON: Record<string, string> = {
  "money.bill.enter.scheduled": "The scheduled run (no person)",
};

const whenFormats = new Map<string, Intl.DateTimeFormat>();

/** "Wed, 2 Dec 2026, 09:14 GMT-6" in the club's time zone (its offset named). */
export function formatAuditTime(instant: Date, timeZone: string): string {
  let format = whenFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat("en-GB", { timeZone, weekday: "short", day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", hourCycle: "h23", timeZoneName: "short" });
    whenFormats.set(timeZone, format);
  }
  return format.format(instant);
}

function wordsOf(key: string): string {
  return key
    .replace(/Minor$/, "")
    .replace(/([a-z0-9])([A-Z])/g, "$1 $2")
    .replace(/[._-]+/g, " ")
    .toLowerCase()
    .trim();
}

const ISO_INSTANT = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})$/;

function formatMoneyWords(minor: number, currency: string): string {
  try {
    const digits = new Intl.NumberFormat("en", { style: "currency", currency }).resolvedOptions().maximumFractionDigits ?? 2;
    return new Intl.NumberFormat("en", { style: "currency", currency }).format(minor / 10 ** digits);
  } catch {
    return `${minor} (minor units of ${currency})`;
  }
}

function valueWords(key: string, value: unknown, words: AuditWords, depth = 0): string {
  if (value === null || value === undefined || value === "") return "none";
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (typeof value === "number") return /Minor$/.test(key) ? formatMoneyWords(value, words.currency) : String(value);
  if (typeof value === "string") {
    const named = words.names?.get(value);
    if (named) return named;
    if (ISO_INSTANT.test(value)) return formatAuditTime(new Date(value), words.timeZone);
    return value;
  }
  if (value instanceof Date) return formatAuditTime(value, words.timeZone);
  if (Array.isArray(value)) return value.length ? value.map((v) => valueWords(key, v, words, depth + 1)).join(", ") : "none";
  if (typeof value === "object") {
    if (depth > 0) return "(several values)";
    const parts = Object.entries(value as Record<string, unknown>)
      .filter(([k]) => isReadableKey(k, (value as Record<string, unknown>)[k], words))
      .map(([k, v]) => `${wordsOf(k)} ${valueWords(k, v, words, depth + 1)}`);
    return parts.length ? parts.join("; ") : "(details kept in the record)";
  }
  return String(value);
}

/** Ids mean nothing to a reader: an id field shows only when its record has a name. */
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function isReadableKey(key: string, value: unknown, words: AuditWords): boolean {
  if (typeof value === "string" && UUID.test(value) && !words.names?.get(value)) return false;
  if (key === "id" || /Ids?$/.test(key) || key === "idempotencyKey" || key === "club") {
    if (typeof value === "string") return Boolean(words.names?.get(value));
    if (Array.isArray(value)) return value.length > 0 && value.every((v) => typeof v === "string" && words.names?.has(v));
    return false;
  }
  return true;
}

function asRecord(value: unknown): Record<string, unknown> | null {
  return value && typeof value === "object" && !Array.isArray(value) ? (value as Record<string, unknown>) : null;
}

/** One entry as a sentence in words and, after it, each changed value ("roles: member → member, instructor"). */
export function describeAuditEntry(entry: AuditEntryInput, words: AuditWords): DescribedAuditEntry {
  const who = entry.actorName ?? NO_PERSON[entry.action] ?? "The system";
  const verb = VERBS[entry.action] ?? `made a change: ${entry.action.split(/[._-]+/).join(", ")}`;
  const subject = words.names?.get(entry.subjectId);
  const sentence = `${who} ${verb}${subject ? ` (${subject})` : ""}.`;

  const before = asRecord(entry.before);
  const after = asRecord(entry.after);
  const details: string[] = [];
  if (before || after) {
    const keys = [...new Set([...Object.keys(before ?? {}), ...Object.keys(after ?? {})])];
    for (const key of keys) {
      const was = before?.[key];
      const now = after?.[key];
      if (!isReadableKey(key, now ?? was, words)) continue;
      const label = wordsOf(key);
      if (before && key in before && after && key in after) {
        if (JSON.stringify(was) === JSON.stringify(now)) continue;
        details.push(`${label}: ${valueWords(key, was, words)} → ${valueWords(key, now, words)}`);
      } else if (before && key in before && !after) {
        details.push(`${label} was ${valueWords(key, was, words)}`);
      } else if (after && key in after) {
        details.push(`${label}: ${valueWords(key, now, words)}`);
      } else {
        details.push(`${label} was ${valueWords(key, was, words)}`);
      }
    }
  } else if (entry.after !== null && entry.after !== undefined) {
    details.push(valueWords("value", entry.after, words));
  }
  return { when: formatAuditTime(entry.createdAt, words.timeZone), sentence, details };
}
