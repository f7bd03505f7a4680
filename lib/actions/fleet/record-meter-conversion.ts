"use server";
import { meterConversions } from "@/db/schema";
import { getAircraft, getItem, listCompletionConversions, listCompletionRecords, listItems } from "@/db/queries/fleet";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { formatHours, nextDue } from "@/lib/airworthiness";
import { isoDateInTimeZone } from "@/lib/dates";
import { maintenanceHours, toInspectionItem } from "@/lib/fleet/status-input";
import { writeAudit } from "@/lib/server/audit";
import { recordMeterConversionSchema } from "@/lib/validation/fleet";

const METER_WORD = { hobbs: "Hobbs", tach: "tach" } as const;

// After the aircraft switched the meter its inspections count by, an hours-based item whose
// last completion was read on the old meter is "Status unknown". Maintenance, from the logbooks,
// records where that completion stands on the new meter: a meter_conversions row that points at
// the completion (the completion itself is append-only and keeps its original reading). The
// rules then use that reading; the history keeps both.
export const recordMeterConversion = clubAction({
  schema: recordMeterConversionSchema,
  permission: ["record", "Inspection"],
  success: "Reading on the new meter recorded.",
  run(tx, { club, user }, input) {
    const item = getItem(tx, club.id, input.itemId);
    if (!item || item.retiredAt) throw new ActionError("That inspection item was not found in this club.", {}, "not_found");
    const plane = getAircraft(tx, club.id, item.aircraftId);
    if (!plane) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
    const meter = plane.maintenanceMeter;
    const completions = listCompletionRecords(tx, club.id, plane.id);
    const conversions = listCompletionConversions(tx, club.id, plane.id);
    const rows = listItems(tx, club.id, plane.id);
    let items;
    try {
      items = rows.map((r) => toInspectionItem(r, completions, meter, conversions));
    } catch {
      throw new ActionError("This item's rule is incomplete; complete the rule first.", {});
    }
    const target = items.find((i) => i.key === item.key);
    const today = isoDateInTimeZone(new Date(), club.timeZone);
    const next = target ? nextDue(target, today, maintenanceHours(plane), items, meter) : null;
    const governing = next?.lastDone;
    if (!next?.meterMismatch || !governing?.id || typeof governing.hours !== "number") {
      throw new ActionError(`${item.name} already counts on the ${METER_WORD[meter]}; nothing to convert.`, {}, "conflict");
    }
    const now = maintenanceHours(plane);
    if (now !== null && input.reading > now + 0.05) {
      throw new ActionError("Some fields need attention; nothing was saved.", { reading: [`That is past the aircraft's current ${METER_WORD[meter]} (${formatHours(now)}); check the reading.`] });
    }
    const values = {
      clubId: club.id,
      aircraftId: plane.id,
      completionId: governing.id,
      fromMeter: next.meterMismatch.completionMeter,
      fromReading: governing.hours,
      toMeter: meter,
      toReading: input.reading,
      note: input.note,
      recordedById: user.id,
    };
    const [row] = tx.insert(meterConversions).values(values).returning({ id: meterConversions.id }).all();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "inspection.meter.convert", subjectType: "InspectionCompletion", subjectId: governing.id, after: { item: item.name, conversionId: row!.id, ...values } });
    return {
      message: `Recorded: the ${item.name.toLowerCase()} of ${governing.date} (${formatHours(governing.hours)} h on the ${METER_WORD[values.fromMeter]}) stands at ${formatHours(input.reading)} h on the ${METER_WORD[meter]}.`,
      refresh: true,
    };
  },
});
