"use server";
import { and, eq, isNull } from "drizzle-orm";
import { checkouts } from "@/db/schema";
import { getCheckout } from "@/db/queries/safety-checkouts";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { revokeCheckoutSchema } from "@/lib/validation/safety";

/** Revoking keeps the checkout as history, with who revoked it, when and why. */
export const revokeCheckout = clubAction({
  schema: revokeCheckoutSchema,
  permission: ["update", "Checkout"],
  success: "Checkout revoked.",
  run(tx, { club, user }, input) {
    const current = getCheckout(tx, club.id, input.checkoutId);
    if (!current) throw new ActionError("That checkout was not found.", {}, "not_found");
    const result = tx
      .update(checkouts)
      .set({ revokedAt: new Date(), revokedById: user.id, revokeReason: input.reason })
      .where(and(eq(checkouts.clubId, club.id), eq(checkouts.id, current.id), isNull(checkouts.revokedAt)))
      .run();
    if (result.changes === 0) throw new ActionError("This checkout was already revoked.", {}, "conflict");
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "checkout.revoke", subjectType: "Checkout", subjectId: current.id, before: { revokedAt: null }, after: { reason: input.reason } });
    return { refresh: true };
  },
});
