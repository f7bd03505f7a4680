// Input guards shared by the money rules: a wrong input must fail loudly rather than post a
// silently wrong amount to a member's account.

export function assertMinorUnits(value: number, name: string): void {
  if (!Number.isSafeInteger(value)) {
    throw new RangeError(`${name} must be a whole number of minor units, got ${value}`);
  }
}

export function assertNonNegativeMinor(value: number, name: string): void {
  assertMinorUnits(value, name);
  if (value < 0) throw new RangeError(`${name} must not be negative, got ${value}`);
}

export function assertFiniteNonNegative(value: number, name: string): void {
  if (!Number.isFinite(value) || value < 0) {
    throw new RangeError(`${name} must be a finite number ≥ 0, got ${value}`);
  }
}

export function assertPositive(value: number, name: string): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a finite number > 0, got ${value}`);
  }
}
