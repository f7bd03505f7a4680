import { assertMinorUnits } from "./checks";

const exponents = new Map<string, number>();

/**
 * Digits after the decimal point in the currency's minor unit, from the runtime's ISO 4217
 * data (USD and EUR 2, JPY 0, KWD 3). Throws RangeError for a code that is not a currency.
 */
export function currencyExponent(currency: string): number {
  const code = currency.toUpperCase();
  const cached = exponents.get(code);
  if (cached !== undefined) return cached;
  const digits = new Intl.NumberFormat("en", { style: "currency", currency: code }).resolvedOptions()
    .maximumFractionDigits;
  const exponent = digits ?? 2;
  exponents.set(code, exponent);
  return exponent;
}

/** Minor units as an exact decimal string: (−1234, 2) → "-12.34". */
export function minorToDecimalString(minor: number, exponent: number): string {
  assertMinorUnits(minor, "minor");
  const negative = minor < 0;
  const digits = String(Math.abs(minor)).padStart(exponent + 1, "0");
  const whole = exponent === 0 ? digits : digits.slice(0, -exponent);
  const frac = exponent === 0 ? "" : `.${digits.slice(-exponent)}`;
  return `${negative ? "-" : ""}${whole}${frac}`;
}

/**
 * Formats minor units in the currency with the locale's conventions. The amount goes to Intl
 * as a decimal string, so large balances are never bent by float conversion.
 */
export function formatMoney(minor: number, currency: string, locale: string = DEFAULT_LOCALE): string {
  return moneyFormatter(currency, locale)(minor);
}

/** The locale a club without one formats for (and the fallback for a tag the runtime lacks). */
export const DEFAULT_LOCALE = "en-US";

/** What every money display needs to know about the club: its currency and its locale. */
export type MoneyLocale = { currency: string; locale?: string | null };

/** The club's amounts as text: clubMoney(club)(289306) → "2.893,06 €" for a de-DE euro club. */
export function clubMoney(club: MoneyLocale): (minor: number) => string {
  return moneyFormatter(club.currency, club.locale || DEFAULT_LOCALE);
}

const numberFormats = new Map<string, Intl.NumberFormat>();

/**
 * A plain number in the locale's digits and separators (ECMA-402 Intl.NumberFormat), at most
 * `maximumFractionDigits` decimals (1 unless given): 1234.56 → "1,234.6" (en-US), "1.234,6" (de-DE).
 */
export function formatNumber(value: number, locale: string = DEFAULT_LOCALE, options: { minimumFractionDigits?: number; maximumFractionDigits?: number } = {}): string {
  const min = options.minimumFractionDigits ?? 0;
  const max = Math.max(min, options.maximumFractionDigits ?? 1);
  const key = `${locale}|${min}|${max}`;
  let nf = numberFormats.get(key);
  if (!nf) {
    nf = new Intl.NumberFormat(locale, { minimumFractionDigits: min, maximumFractionDigits: max });
    numberFormats.set(key, nf);
  }
  return nf.format(value);
}

/**
 * Major units (a number or decimal text such as "12.5") to minor units of the currency.
 * Throws when the value has more decimals than the currency's minor unit, rather than
 * inventing a rounding the member never agreed to.
 */
export function toMinorUnits(major: number | string, currency: string): number {
  const exponent = currencyExponent(currency);
  const text = typeof major === "number" ? String(major) : major.trim();
  const m = /^([+-]?)(\d*)(?:\.(\d*))?$/.exec(text);
  if (!m || (m[2] === "" && !m[3])) throw new RangeError(`Not an amount: "${text}"`);
  const frac = m[3] ?? "";
  if (frac.length > exponent && /[1-9]/.test(frac.slice(exponent))) {
    throw new RangeError(`${text} has more decimals than ${currency.toUpperCase()} allows (${exponent})`);
  }
  const units = BigInt((m[2] || "0") + frac.slice(0, exponent).padEnd(exponent, "0"));
  const value = Number(m[1] === "-" ? -units : units);
  if (!Number.isSafeInteger(value)) throw new RangeError(`${text} is too large`);
  return value === 0 ? 0 : value;
}

// An Intl.NumberFormat per call costs more than the rest of a billing run for thousands of
// statements: one formatter per currency and locale, kept.
const formatters = new Map<string, (minor: number) => string>();

export function moneyFormatter(currency: string, locale: string = DEFAULT_LOCALE): (minor: number) => string {
  const key = `${locale}|${currency.toUpperCase()}`;
  let f = formatters.get(key);
  if (!f) {
    const exponent = currencyExponent(currency);
    const nf = new Intl.NumberFormat(locale, { style: "currency", currency: currency.toUpperCase(), minimumFractionDigits: exponent, maximumFractionDigits: exponent });
    // The amount goes to Intl as a decimal string (Intl.NumberFormat v3, Node ≥ 19), exact at any size.
    f = (minor: number) => nf.format(minorToDecimalString(minor, exponent) as `${number}`);
    formatters.set(key, f);
  }
  return f;
}
