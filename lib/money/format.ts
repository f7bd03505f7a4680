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
export function formatMoney(minor: number, currency: string, locale = "en-US"): string {
  const exponent = currencyExponent(currency);
  const format = new Intl.NumberFormat(locale, {
    style: "currency",
    currency: currency.toUpperCase(),
    minimumFractionDigits: exponent,
    maximumFractionDigits: exponent,
  });
  // The ES2023 typings accept a decimal string (Intl.NumberFormat v3, Node ≥ 19).
  return format.format(minorToDecimalString(minor, exponent) as `${number}`);
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

// formatMoney builds an Intl.NumberFormat per call, which costs more than the rest of a billing
// run for thousands of statements. Same output, one formatter per currency and locale.
const formatters = new Map<string, (minor: number) => string>();

export function moneyFormatter(currency: string, locale = "en-US"): (minor: number) => string {
  const key = `${locale}|${currency.toUpperCase()}`;
  let f = formatters.get(key);
  if (!f) {
    const exponent = currencyExponent(currency);
    const nf = new Intl.NumberFormat(locale, { style: "currency", currency: currency.toUpperCase(), minimumFractionDigits: exponent, maximumFractionDigits: exponent });
    f = (minor: number) => nf.format(minorToDecimalString(minor, exponent) as `${number}`);
    formatters.set(key, f);
  }
  return f;
}
