import { formatIsoDate, isIsoDateInRange } from "@/lib/dates";

export type AmountOptions = {
  /** European style: "1.234,56" (a comma before the cents, dots or spaces between thousands). */
  decimalComma?: boolean;
  /** Digits of the currency's minor unit (default 2; 0 for JPY). */
  exponent?: number;
};

const SPACES = /[\s\u00a0\u2009\u202f]/g;
const CURRENCY_MARKS = /^[A-Z]{3}|[A-Z]{3}$|[$€£¥₣₹]/g;

function stripSign(s: string): { body: string; negative: boolean } {
  let body = s;
  let negative = false;
  if (body.startsWith("(") && body.endsWith(")")) {
    negative = true;
    body = body.slice(1, -1);
  }
  if (/^[-−]/.test(body)) {
    negative = true;
    body = body.slice(1);
  } else if (body.startsWith("+")) {
    body = body.slice(1);
  } else if (body.endsWith("-")) {
    negative = true;
    body = body.slice(0, -1);
  }
  return { body, negative };
}

function checkGrouping(whole: string, groupSeparators: string): string {
  const separators = [...groupSeparators].filter((g) => whole.includes(g));
  if (separators.length === 0) return whole;
  const sep = separators[0] ?? "";
  const escaped = sep.replace(/[.]/g, "\\.");
  if (separators.length > 1 || !new RegExp(`^\\d{1,3}(${escaped}\\d{3})+$`).test(whole)) {
    throw new Error(`"${whole}" is not a grouped number (check the decimal-comma setting)`);
  }
  return whole.split(sep).join("");
}

/**
 * Reads a statement amount into integer minor units: thousands separators, a leading or
 * trailing minus, parentheses for negatives (accounting style), currency symbols and ISO
 * codes at either end. More decimals than the currency has is an error unless they are zeros,
 * because a bank account cannot hold a fraction of a cent.
 */
export function parseAmountText(text: string, options: AmountOptions = {}): number {
  const exponent = options.exponent ?? 2;
  if (!Number.isInteger(exponent) || exponent < 0 || exponent > 6) {
    throw new RangeError(`exponent must be 0–6, got ${exponent}`);
  }
  const compact = text.replace(SPACES, "").replace(CURRENCY_MARKS, "");
  const { body: signed, negative: outer } = stripSign(compact);
  const { body, negative: inner } = stripSign(signed.replace(CURRENCY_MARKS, ""));
  const decimalSep = options.decimalComma ? "," : ".";
  const parts = body.split(decimalSep);
  if (body === "" || parts.length > 2) throw new Error(`"${text.trim()}" is not an amount`);
  const whole = checkGrouping(parts[0] ?? "", options.decimalComma ? ".'’" : ",'’");
  const frac = parts[1] ?? "";
  if (!/^\d*$/.test(whole) || !/^\d*$/.test(frac) || whole + frac === "") {
    throw new Error(`"${text.trim()}" is not an amount`);
  }
  if (frac.length > exponent && /[1-9]/.test(frac.slice(exponent))) {
    throw new Error(`"${text.trim()}" has more than ${exponent} decimals`);
  }
  const units = BigInt((whole || "0") + frac.slice(0, exponent).padEnd(exponent, "0"));
  const value = Number(outer || inner ? -units : units);
  if (!Number.isSafeInteger(value)) throw new Error(`"${text.trim()}" is too large`);
  return value === 0 ? 0 : value;
}

export type DateFormat = "ISO" | "YYYY-MM-DD" | "MM/DD/YYYY" | "DD/MM/YYYY" | "DD.MM.YYYY";

const DATE_PATTERNS: Record<DateFormat, { re: RegExp; order: [number, number, number] }> = {
  // Groups in the order year, month, day; a trailing time ("T10:22", " 10:22:05") is ignored.
  ISO: { re: /^(\d{4})-(\d{2})-(\d{2})(?:[T ].*)?$/, order: [1, 2, 3] },
  "YYYY-MM-DD": { re: /^(\d{4})-(\d{2})-(\d{2})(?:[T ].*)?$/, order: [1, 2, 3] },
  "MM/DD/YYYY": { re: /^(\d{1,2})\/(\d{1,2})\/(\d{4})(?: .*)?$/, order: [3, 1, 2] },
  "DD/MM/YYYY": { re: /^(\d{1,2})\/(\d{1,2})\/(\d{4})(?: .*)?$/, order: [3, 2, 1] },
  "DD.MM.YYYY": { re: /^(\d{1,2})\.(\d{1,2})\.(\d{4})(?: .*)?$/, order: [3, 2, 1] },
};

/** Reads a statement date in the given format into an ISO calendar date. */
export function parseDateText(text: string, format: DateFormat = "ISO"): string {
  const pattern = DATE_PATTERNS[format];
  if (!pattern) throw new TypeError(`Unknown date format "${String(format)}"`);
  const m = pattern.re.exec(text.trim());
  if (!m) throw new Error(`"${text.trim()}" is not a ${format} date`);
  const [y, mo, d] = pattern.order.map((i) => Number(m[i])) as [number, number, number];
  const iso = formatIsoDate(y, mo, d);
  if (!isIsoDateInRange(iso)) throw new Error(`"${text.trim()}" is not a calendar date between 1900 and 2200`);
  return iso;
}
