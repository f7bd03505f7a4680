import { currencyExponent, minorToDecimalString } from "@/lib/money";

// formatMoney (lib/money) builds an Intl.NumberFormat per call, which costs more than the rest of
// a billing run for thousands of statements. Same output, one formatter per currency and locale.
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
