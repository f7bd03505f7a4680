import type { AppAbility } from "@/permissions";
import { canOn } from "@/permissions";

export type MedicalRecordLike = {
  kind: "faa_class" | "basicmed";
  medicalClass: number | null;
  examDate: string;
  courseDate: string | null;
  limitations: string | null;
  expiresOn: string;
};

export type MedicalView =
  | { level: "full"; kind: MedicalRecordLike["kind"]; medicalClass: number | null; examDate: string; courseDate: string | null; limitations: string | null; expiresOn: string }
  | { level: "expiry"; expiresOn: string };

/**
 * What a viewer may see of someone's medical: the details (class, exam, limitations) only the
 * member themselves and club admins (readDetails Medical); the expiry date alone anyone who
 * reads that member's currency (instructors, safety officer); otherwise nothing. The date of
 * birth is never part of this: it stays on the member's private record.
 */
export function medicalViewFor(ability: AppAbility, ownerUserId: string, record: MedicalRecordLike): MedicalView | null {
  if (canOn(ability, "readDetails", "Medical", { userId: ownerUserId })) {
    const { kind, medicalClass, examDate, courseDate, limitations, expiresOn } = record;
    return { level: "full", kind, medicalClass, examDate, courseDate, limitations, expiresOn };
  }
  if (canOn(ability, "read", "Currency", { userId: ownerUserId })) return { level: "expiry", expiresOn: record.expiresOn };
  return null;
}
