import { roundQuotient } from "./decimal";

export type FuelCreditInput = {
  /** Gallons or litres bought away from home (the club's unit), e.g. 18.4. */
  quantity: number;
  /** What the member paid per gallon or litre, in minor units. */
  paidPerUnitMinor: number;
  /** The club's most per gallon or litre; null or undefined means no cap. */
  capPerUnitMinor?: number | null;
};

/**
 * The fuel credit for fuel a member bought away from home: quantity × the lower of the price
 * paid and the club's cap, rounded half away from zero to the minor unit. The club never
 * credits more per unit than it would have paid at home, and never more than the receipt.
 */
export function fuelCreditMinor(input: FuelCreditInput): number {
  const { quantity, paidPerUnitMinor, capPerUnitMinor } = input;
  if (!Number.isFinite(quantity) || quantity < 0) throw new RangeError(`quantity must be a finite number ≥ 0, got ${quantity}`);
  if (!Number.isSafeInteger(paidPerUnitMinor) || paidPerUnitMinor < 0) throw new RangeError(`paidPerUnitMinor must be whole minor units ≥ 0, got ${paidPerUnitMinor}`);
  if (capPerUnitMinor !== null && capPerUnitMinor !== undefined && (!Number.isSafeInteger(capPerUnitMinor) || capPerUnitMinor < 0)) {
    throw new RangeError(`capPerUnitMinor must be whole minor units ≥ 0, got ${capPerUnitMinor}`);
  }
  const perUnit = capPerUnitMinor === null || capPerUnitMinor === undefined ? paidPerUnitMinor : Math.min(paidPerUnitMinor, capPerUnitMinor);
  return roundQuotient([quantity, perUnit]);
}
