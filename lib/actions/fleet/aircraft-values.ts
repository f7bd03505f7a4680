import "server-only";
import type { z } from "zod";
import type { Club, NewInspectionItemRow } from "@/db/schema";
import { ActionError } from "@/lib/actions/action-state";
import { defaultItemColumns } from "@/lib/fleet/default-items";
import { toMinorUnits } from "@/lib/money";
import type { createAircraftSchema } from "@/lib/validation/fleet";

type AircraftInput = z.output<typeof createAircraftSchema>;

/** Form values → aircraft columns; the hourly rate becomes integer minor units of the club's currency. */
export function aircraftValues(club: Club, input: AircraftInput) {
  let hourlyRateMinor: number;
  try {
    hourlyRateMinor = toMinorUnits(input.hourlyRate, club.currency);
  } catch {
    throw new ActionError("Some fields need attention; nothing was saved.", { hourlyRate: [`Enter the hourly rate in ${club.currency}, like 145.00.`] });
  }
  return {
    registration: input.registration,
    make: input.make,
    model: input.model,
    typeGroup: input.typeGroup,
    category: input.category,
    classRating: input.classRating,
    tailwheel: input.tailwheel,
    serialNumber: input.serialNumber,
    year: input.year,
    homeField: input.homeField,
    hourlyRateMinor,
    rateMeter: input.rateMeter,
    maintenanceMeter: input.maintenanceMeter,
    currentHobbs: input.currentHobbs,
    currentTach: input.currentTach,
    usedForHire: input.usedForHire,
    usedForInstruction: input.usedForInstruction,
    ifrEquipped: input.ifrEquipped,
    usedForIfr: input.usedForIfr,
    engineTboHours: input.engineTboHours,
    engineTimeSinceOverhaul: input.engineTimeSinceOverhaul,
    notes: input.notes,
  };
}

export function defaultItemRows(club: Club, aircraftId: string): NewInspectionItemRow[] {
  return defaultItemColumns({ months: club.settings.oilChangeMonths, hours: club.settings.oilChangeHours }).map((c) => ({ ...c, clubId: club.id, aircraftId }));
}
