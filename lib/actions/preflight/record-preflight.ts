"use server";
import { preflightRecordItems, preflightRecords } from "@/db/schema";
import { getAircraft } from "@/db/queries/fleet";
import { createSquawk } from "@/db/queries/fleet-squawks";
import { getPreflightTemplate, preflightTanks } from "@/db/queries/tools-preflight";
import { loadBookingForParty } from "@/lib/actions/bookings/booking-access";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { checkFiles, discardStored, insertUploadRows, storeFiles, withStoredFiles, type StoredFile } from "@/lib/actions/fleet/files";
import { alertPossiblyUnsafeSquawk } from "@/lib/actions/fleet/squawk-alert";
import { kickOutbox } from "@/lib/email/runner";
import { toldText } from "@/lib/fleet/squawk-words";
import { evaluatePreflight, findingDescription, fuelAboveCapacity } from "@/lib/bookings/preflight-outcome";
import { writeAudit } from "@/lib/server/audit";
import { IMAGE_TYPES } from "@/lib/storage";
import { preflightRecordSchema } from "@/lib/validation/tools";

const INVALID = "Some fields need attention; nothing was saved.";

// One step: the record, its items and — for every finding — a squawk with its photos, so
// maintenance sees it on the flight line at once. The record is attached to the booking.
// A finding marked "may affect airworthiness" sends the same alert as a squawk report so
// marked (alertPossiblyUnsafeSquawk, through the outbox in this transaction).
export const recordPreflight = clubAction({
  schema: preflightRecordSchema,
  permission: ["create", "Squawk"],
  success: "Preflight recorded.",
  after: () => kickOutbox(),
  async prepare(_ctx, input) {
    const stored = new Map<string, StoredFile[]>();
    try {
      for (const [itemId, item] of Object.entries(input.items)) {
        if (item.result !== "finding" || item.photos.length === 0) continue;
        stored.set(itemId, storeFiles(await checkFiles(item.photos, IMAGE_TYPES, `items.${itemId}.photos`)));
      }
    } catch (error) {
      // A refused file later in the form: the bytes already written for earlier items go too.
      discardStored([...stored.values()].flat());
      throw error;
    }
    return stored;
  },
  discard: (stored) => discardStored([...stored.values()].flat()),
  run(tx, ctx, input, stored) {
    const all = [...stored.values()].flat();
    return withStoredFiles(all, () => {
      const { club, user } = ctx;
      const booking = loadBookingForParty(tx, ctx, input.bookingId);
      if (booking.status !== "reserved" && booking.status !== "dispatched") throw new ActionError(`This booking is ${booking.status === "checked_in" ? "flown and its flight sheet closed" : "cancelled"}; a preflight can no longer be recorded on it.`, {}, "conflict");
      const template = getPreflightTemplate(tx, club.id, booking.aircraftId);
      if (!template) throw new ActionError("This aircraft has no preflight checklist yet; ask maintenance to set one up.", {}, "not_found");

      const errors: Record<string, string[]> = {};
      for (const item of template.items) if (!input.items[item.id]) errors[`items.${item.id}.result`] = ["Mark this item OK or a finding."];
      for (const itemId of Object.keys(input.items)) if (!template.items.some((i) => i.id === itemId)) errors._form = ["The checklist changed while you were filling it in; reload the page."];
      if (input.sumps.length !== template.sumpPoints.length || input.sumps.some((s, i) => s.point !== template.sumpPoints[i])) errors.sumps = ["Record a result for every fuel drain point."];
      const tanks = preflightTanks(tx, club.id, template, booking.aircraftId);
      if (input.fuelTank.length !== tanks.length || input.fuelQuantity.length !== tanks.length || input.fuelTank.some((t, i) => t !== tanks[i]!.name)) errors.fuelQuantity = ["Enter the fuel in every tank."];
      if (Object.keys(errors).length) throw new ActionError(INVALID, errors);

      const metric = club.unitSystem === "metric";
      const fuel = tanks.map((t, i) => ({ tank: t.name, quantity: input.fuelQuantity[i] ?? 0, capacity: t.capacity }));
      // More than a tank holds is a misread, not a finding: refused, naming the tank.
      const overfull = fuelAboveCapacity(fuel, metric ? "L" : "US gal");
      if (overfull.length) {
        throw new ActionError(`${overfull.map((o) => o.message).join(" ")} Nothing was saved.`, Object.fromEntries(overfull.map((o) => [`fuelQuantity.${o.index}`, [o.message]])));
      }
      const itemResults = template.items.map((t) => ({ template: t, ...input.items[t.id]! }));
      const outcome = evaluatePreflight({
        items: itemResults.map((r) => ({ section: r.template.section, label: r.template.label, kind: r.template.kind, result: r.result, note: r.note })),
        sumps: input.sumps,
        oilQuantity: input.oilQuantity,
        oilMinimum: template.oilMinimum,
        oilMaximum: template.oilMaximum,
        oilUnit: metric ? "L" : "qt",
        fuel,
        fuelUnit: metric ? "L" : "US gal",
      });
      const [record] = tx
        .insert(preflightRecords)
        .values({
          clubId: club.id, bookingId: booking.id, aircraftId: booking.aircraftId, userId: user.id, templateId: template.id,
          fuel: fuel.map(({ tank, quantity }) => ({ tank, quantity })), fuelUnit: metric ? "l" : "gal", sumps: input.sumps,
          oilQuantity: input.oilQuantity, oilMinimum: template.oilMinimum, oilUnit: metric ? "l" : "qt",
          outcome: outcome.outcome, findingCount: outcome.findings.length, notes: input.notes,
        })
        .returning({ id: preflightRecords.id })
        .all();

      const squawkIds: string[] = [];
      const emailed = { maintenance: 0, booking: 0 };
      const plane = getAircraft(tx, club.id, booking.aircraftId);
      if (!plane) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
      for (const r of itemResults) {
        let squawkId: string | null = null;
        if (r.result === "finding") {
          squawkId = createSquawk(tx, {
            clubId: club.id, aircraftId: booking.aircraftId, reportedById: user.id, description: findingDescription(r.template, r.note), foundDuring: "preflight", suspectedGrounding: r.grounding,
            note: "Found during the preflight of a booking.",
          });
          squawkIds.push(squawkId);
          if (r.grounding) {
            const sent = alertPossiblyUnsafeSquawk(tx, club, plane, { id: squawkId, description: findingDescription(r.template, r.note), foundDuring: "preflight", reporter: { id: user.id, name: user.name ?? null } });
            emailed.maintenance += sent.maintenance;
            emailed.booking += sent.booking;
          }
          insertUploadRows(tx, { clubId: club.id, subjectType: "Squawk", subjectId: squawkId, uploadedById: user.id }, stored.get(r.template.id) ?? []);
        }
        tx.insert(preflightRecordItems)
          .values({ clubId: club.id, recordId: record!.id, templateItemId: r.template.id, section: r.template.section, label: r.template.label, kind: r.template.kind, result: r.result, note: r.note, squawkId })
          .run();
      }
      writeAudit(tx, { clubId: club.id, actorId: user.id, action: "preflight.record", subjectType: "Booking", subjectId: booking.id, after: { recordId: record!.id, outcome: outcome.outcome, findings: outcome.findings, squawkIds } });
      const told = toldText(emailed.maintenance, emailed.booking);
      const recorded = outcome.outcome === "ok"
        ? "Preflight recorded: everything as expected. You can begin the flight."
        : `Preflight recorded with ${outcome.findings.length} finding${outcome.findings.length === 1 ? "" : "s"}${squawkIds.length ? `; ${squawkIds.length} reported as squawk${squawkIds.length === 1 ? "" : "s"} for maintenance` : ""}.`;
      const message = told ? `${recorded} Marked as possibly affecting airworthiness: ${told}.` : recorded;
      return { message, data: { recordId: record!.id, squawkIds, findings: outcome.findings, emailed }, refresh: true };
    });
  },
});
