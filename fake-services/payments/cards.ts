// Card checks of the fake hosted payment page. Numbers follow the payment provider's published
// test cards (from memory of its testing documentation): each one always produces the same
// outcome. Any other number passing the Luhn check succeeds; a number failing it is refused
// before any payment is attempted, as a real payment form would.
import type { CardDetails, PaymentError } from "./store";

export interface CardInput {
  number: string;
  /** "MM/YY", "MM/YYYY" or "MM / YY". */
  expiry: string;
  cvc: string;
}

export type CardCheck =
  | { ok: true; card: CardDetails }
  | { ok: false; code: string; message: string; param: "number" | "exp_month" | "exp_year" | "cvc" };

const DECLINES: Record<string, PaymentError> = {
  "4000000000000002": { type: "card_error", code: "card_declined", decline_code: "generic_decline", message: "Your card was declined." },
  "4000000000009995": {
    type: "card_error",
    code: "card_declined",
    decline_code: "insufficient_funds",
    message: "Your card has insufficient funds.",
  },
  "4000000000009987": { type: "card_error", code: "card_declined", decline_code: "lost_card", message: "Your card was declined." },
  "4000000000009979": { type: "card_error", code: "card_declined", decline_code: "stolen_card", message: "Your card was declined." },
  "4000000000000069": { type: "card_error", code: "expired_card", decline_code: "expired_card", message: "Your card has expired." },
  "4000000000000127": {
    type: "card_error",
    code: "incorrect_cvc",
    decline_code: "incorrect_cvc",
    message: "Your card's security code is incorrect.",
  },
  "4000000000000119": {
    type: "card_error",
    code: "processing_error",
    decline_code: "processing_error",
    message: "An error occurred while processing your card. Try again in a little bit.",
  },
};

export function normalizeCardNumber(raw: string): string {
  return raw.replace(/[\s-]/g, "");
}

/** Luhn mod-10 check (ISO/IEC 7812-1 check digit). */
export function passesLuhn(digits: string): boolean {
  if (!/^\d{12,19}$/.test(digits)) return false;
  let sum = 0;
  for (let i = 0; i < digits.length; i++) {
    let d = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) {
      d *= 2;
      if (d > 9) d -= 9;
    }
    sum += d;
  }
  return sum % 10 === 0;
}

export function detectBrand(digits: string): string {
  if (/^4/.test(digits)) return "visa";
  if (/^(5[1-5]|2(2[2-9]|[3-6]\d|7[01]|720))/.test(digits)) return "mastercard";
  if (/^3[47]/.test(digits)) return "amex";
  if (/^(6011|65|64[4-9])/.test(digits)) return "discover";
  return "unknown";
}

function parseExpiry(raw: string): { month: number; year: number } | null {
  const m = /^\s*(\d{1,2})\s*\/\s*(\d{2}|\d{4})\s*$/.exec(raw);
  if (!m) return null;
  const month = Number(m[1]);
  const yearText = m[2] ?? "";
  const year = yearText.length === 2 ? 2000 + Number(yearText) : Number(yearText);
  return month >= 1 && month <= 12 ? { month, year } : null;
}

/** Format checks a payment form makes before contacting the card network. */
export function checkCard(input: CardInput, now: Date = new Date()): CardCheck {
  const digits = normalizeCardNumber(input.number);
  if (!passesLuhn(digits)) return { ok: false, code: "incorrect_number", message: "Your card number is incorrect.", param: "number" };
  const exp = parseExpiry(input.expiry);
  if (!exp) return { ok: false, code: "invalid_expiry_month", message: "Your card's expiration date is incomplete.", param: "exp_month" };
  // A card is good through the last day of its expiry month.
  const nowIndex = now.getUTCFullYear() * 12 + now.getUTCMonth();
  if (exp.year * 12 + (exp.month - 1) < nowIndex) {
    return { ok: false, code: "invalid_expiry_year", message: "Your card's expiration date is in the past.", param: "exp_year" };
  }
  const brand = detectBrand(digits);
  const cvcLength = brand === "amex" ? 4 : 3;
  if (!new RegExp(`^\\d{${cvcLength}}$`).test(input.cvc.trim())) {
    return { ok: false, code: "invalid_cvc", message: "Your card's security code is invalid.", param: "cvc" };
  }
  return {
    ok: true,
    card: { brand, last4: digits.slice(-4), exp_month: exp.month, exp_year: exp.year, funding: "credit" },
  };
}

/** null when the card network approves; otherwise the decline it answers with. */
export function declineFor(number: string): PaymentError | null {
  const decline = DECLINES[normalizeCardNumber(number)];
  return decline ? { ...decline } : null;
}
