import { toMinorUnits } from "@/lib/money";
import { ActionError } from "@/lib/actions/action-state";

/** A typed amount in major units → minor units of the club's currency, or a field error. */
export function minorOf(value: string, currency: string, field: string): number {
  try {
    return toMinorUnits(value, currency);
  } catch (error) {
    const message = error instanceof RangeError ? `That amount does not fit ${currency}: ${error.message}.` : "That is not an amount.";
    throw new ActionError("Some fields need attention; nothing was saved.", { [field]: [message] });
  }
}
