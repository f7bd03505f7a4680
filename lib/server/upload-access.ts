import type { Upload } from "@/db/schema";
import { own, type AppAbility } from "@/permissions";

// Who may read a stored file follows what it belongs to. Unknown kinds are readable by nobody.
export function canReadUpload(ability: AppAbility, upload: Pick<Upload, "subjectType" | "ownerUserId">): boolean {
  switch (upload.subjectType) {
    case "Squawk":
    case "Aircraft":
      return ability.can("read", "Squawk");
    case "InspectionCompletion":
      return ability.can("read", "Inspection");
    case "Bulletin":
      return ability.can("read", "Bulletin");
    case "MemberDocument":
      return ability.can("read", own("MemberDocument", upload.ownerUserId ?? ""));
    case "Medical":
      // Medical scans: the member and club admins only, never the safety officer or instructors.
      return ability.can("readDetails", own("Medical", upload.ownerUserId ?? ""));
    case "SafetyReport":
      return ability.can("read", "SafetyReport") && ability.can("triage", "SafetyReport");
    case "FuelReceipt":
      return ability.can("read", own("Account", upload.ownerUserId ?? ""));
    case "BankStatement":
      return ability.can("reconcile", "Reconciliation");
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
