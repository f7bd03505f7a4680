import { documentExpiryStatus } from "@/lib/currency";
import type { MemberDocument } from "@/db/schema/safety";

/** The JSON shape of a member document for route handlers (no storage keys, no uploader ids). */
export function documentJson(slug: string, doc: MemberDocument & { fileName: string | null }, today: string, warnDays: number) {
  return {
    id: doc.id,
    userId: doc.userId,
    kind: doc.kind,
    reference: doc.reference,
    details: doc.details,
    issuedOn: doc.issuedOn,
    expiresOn: doc.expiresOn,
    status: doc.expiresOn ? documentExpiryStatus(doc.expiresOn, today, warnDays) : "no_expiry",
    file: doc.uploadId ? { name: doc.fileName, url: `/api/clubs/${slug}/uploads/${doc.uploadId}` } : null,
  };
}
