"use server";
import { billApprovalOverMinor, enterBill } from "@/db/queries/money-bills";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { checkFiles, discardStored, insertUploadRows, storeFiles, withStoredFiles } from "@/lib/actions/fleet/files";
import { formatMoney } from "@/lib/money";
import { writeAudit } from "@/lib/server/audit";
import { DOCUMENT_TYPES } from "@/lib/storage";
import { enterBillSchema } from "@/lib/validation/money";
import { minorOf } from "./amounts";
import { ledger } from "./ledger-errors";

// A bill received: booked to its category against "Bills to pay" on its date, with the invoice
// attached. Above the club's approval amount it waits for a second officer before it is paid.
export const enterBillAction = clubAction({
  schema: enterBillSchema,
  permission: ["create", "Bill"],
  success: "Bill entered.",
  async prepare(_ctx, input) {
    return storeFiles(await checkFiles(input.attachment, DOCUMENT_TYPES, "attachment"));
  },
  discard: discardStored,
  run(tx, { club, user }, input, stored) {
    return withStoredFiles(stored, () => {
      const amountMinor = minorOf(input.amount, club.currency, "amount");
      const bill = ledger(() => enterBill(tx, club, user.id, { vendor: input.vendor, billDate: input.billDate, dueOn: input.dueOn, accountCode: input.accountCode, amountMinor, reference: input.reference }));
      if ("refused" in bill) throw new ActionError("Some fields need attention; nothing was saved.", { [bill.field ?? "_form"]: [bill.refused] });
      insertUploadRows(tx, { clubId: club.id, subjectType: "Bill", subjectId: bill.id, uploadedById: user.id }, stored);
      writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.bill.enter", subjectType: "Bill", subjectId: bill.id, after: { ...input, attachment: stored.map((f) => f.originalName), amountMinor, status: bill.status, entryId: bill.entryId } });
      const waits = bill.status === "awaiting_approval";
      return {
        message: `Bill from ${bill.vendor} for ${formatMoney(amountMinor, club.currency, club.locale)} entered${waits ? `; above ${formatMoney(billApprovalOverMinor(tx, club.id), club.currency, club.locale)}, it waits for a second officer's approval before it is paid` : " and ready to pay"}.`,
        data: { billId: bill.id, status: bill.status },
        refresh: true,
      };
    });
  },
});
