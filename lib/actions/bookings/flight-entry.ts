import "server-only";
import { FlightRefused } from "@/db/queries/flight-record";
import { ActionError } from "@/lib/actions/action-state";
import { isLedgerError } from "@/lib/money/errors";

// The flight log and the flight sheet write a flight through one function, recordFlight in
// db/queries/flight-record.ts (the flight, its meters, its squawk and its charge). This turns
// that function's refusals into the action's answer, the same way for both.
export function asFlightActionError(error: unknown, prefix: string): never {
  if (error instanceof FlightRefused) throw new ActionError(error.message, error.fieldErrors, error.code);
  if (isLedgerError(error)) throw new ActionError(`${prefix}: ${error.message}`, { _form: [error.message] }, "conflict");
  throw error;
}
