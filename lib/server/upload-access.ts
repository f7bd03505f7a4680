import type { Upload } from "@/db/schema";
import { type AppAbility, can, canAll, canOn } from "@/permissions";

// Who may read a stored file follows what it belongs to. Unknown kinds are readable by nobody.
export function canReadUpload(ability: AppAbility, upload: Pick<Upload, "subjectType" | "ownerUserId">): boolean {
  switch (upload.subjectType) {
    case "Squawk":
    case "Aircraft":
      return can(ability, "read", "Squawk");
    case "InspectionCompletion":
      return can(ability, "read", "Inspection");
    case "Bulletin":
      return can(ability, "read", "Bulletin");
    case "MemberDocument":
      return canOn(ability, "read", "MemberDocument", { userId: upload.ownerUserId ?? "" });
    case "Medical":
      // Medical scans: the member and club admins only, never the safety officer or instructors.
      return canOn(ability, "readDetails", "Medical", { userId: upload.ownerUserId ?? "" });
    case "SafetyReport":
      return canAll(ability, "read", "SafetyReport") && can(ability, "triage", "SafetyReport");
    case "FuelReceipt":
      return canOn(ability, "read", "Account", { userId: upload.ownerUserId ?? "" });
    case "BankStatement":
      return can(ability, "reconcile", "Reconciliation");
    case "Bill":
      return can(ability, "read", "Bill");
    default:
      return false;
  }
}

/**
 * Files every member of the club may open (aircraft and squawk photos, inspection paperwork)
 * may sit in the browser's private cache for a few minutes; every other kind (a member's
 * documents and medical, reports, receipts, statements, bulletin attachments that may have a
 * narrower audience) is "no-store": never kept by the browser or anything in between.
 */
export function isClubWideUpload(upload: Pick<Upload, "subjectType">): boolean {
  return upload.subjectType === "Squawk" || upload.subjectType === "Aircraft" || upload.subjectType === "InspectionCompletion";
}
