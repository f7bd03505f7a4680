// Exact decimal arithmetic for the places where money meets non-integer inputs (meter hours,
// fuel burn, TBO). A JS number's shortest round-trip string is the decimal that was typed, so
// scaling that string to a BigInt avoids binary-float error: 1.2 h × 14500 is 17400, never
// 17399.999…, and 1234.7 − 1233.5 is exactly 1.2.

/** value = units / 10^scale */
export type Scaled = { units: bigint; scale: number };

const NUMBER_TEXT = /^(-?)(\d+)(?:\.(\d+))?(?:e([+-]\d+))?$/;

export function toScaled(value: number): Scaled {
  if (!Number.isFinite(value)) throw new RangeError(`Not a finite number: ${value}`);
  const m = NUMBER_TEXT.exec(String(value));
  if (!m) throw new RangeError(`Cannot read ${value} as a decimal`);
  const frac = m[3] ?? "";
  let digits = (m[2] ?? "0") + frac;
  let scale = frac.length - Number(m[4] ?? "0");
  if (scale < 0) {
    digits += "0".repeat(-scale);
    scale = 0;
  }
  const units = BigInt(digits);
  return { units: m[1] === "-" ? -units : units, scale };
}

function pow10(n: number): bigint {
  return 10n ** BigInt(n);
}

/** a − b, exactly. */
export function subtractScaled(a: Scaled, b: Scaled): Scaled {
  const scale = Math.max(a.scale, b.scale);
  return { units: a.units * pow10(scale - a.scale) - b.units * pow10(scale - b.scale), scale };
}

/** n ÷ d rounded to an integer, ties away from zero (−2.5 → −3, 2.5 → 3). */
export function divideHalfAwayFromZero(n: bigint, d: bigint): bigint {
  if (d === 0n) throw new RangeError("Division by zero");
  if (d < 0n) {
    n = -n;
    d = -d;
  }
  const negative = n < 0n;
  const a = negative ? -n : n;
  let q = a / d;
  if (2n * (a % d) >= d) q += 1n;
  return negative ? -q : q;
}

function toSafeNumber(value: bigint): number {
  const n = Number(value);
  if (!Number.isSafeInteger(n)) throw new RangeError(`Result ${value} is too large for exact minor units`);
  return n;
}

/**
 * (product of numerators) ÷ (product of denominators), rounded half away from zero to an
 * integer, computed exactly on the decimal values of the inputs.
 */
export function roundScaledQuotient(numerators: readonly Scaled[], denominators: readonly Scaled[]): number {
  let n = 1n;
  let d = 1n;
  for (const x of numerators) {
    n *= x.units;
    d *= pow10(x.scale);
  }
  for (const x of denominators) {
    d *= x.units;
    n *= pow10(x.scale);
  }
  return toSafeNumber(divideHalfAwayFromZero(n, d));
}

/** Same as roundScaledQuotient, on plain numbers. */
export function roundQuotient(numerators: readonly number[], denominators: readonly number[] = []): number {
  return roundScaledQuotient(numerators.map(toScaled), denominators.map(toScaled));
}

/**
 * Rounds half away from zero to `digits` decimal places (default: a whole number, i.e. one
 * minor unit when the value is in minor units). Ties are decided on the value's decimal text,
 * so 1.005 → 1.01 and −2.5 → −3; a negative amount rounds to the mirror image of the positive
 * one, which keeps charges and their refunds symmetric.
 */
export function roundHalfAwayFromZero(value: number, digits = 0): number {
  if (!Number.isInteger(digits) || digits < -20 || digits > 20) {
    throw new RangeError(`digits must be an integer from -20 to 20, got ${digits}`);
  }
  const x = toScaled(value);
  const shift = x.scale - digits;
  const q =
    shift >= 0
      ? divideHalfAwayFromZero(x.units, pow10(shift))
      : x.units * pow10(-shift);
  return Number(`${q}e${-digits}`);
}

/** Hours between two meter readings, exact on their decimal values (1234.7 − 1233.5 = 1.2). */
export function subtractExact(a: number, b: number): number {
  const d = subtractScaled(toScaled(a), toScaled(b));
  return Number(`${d.units}e${-d.scale}`);
}
