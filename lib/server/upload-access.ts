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
    default:
      return false;
  }
}
