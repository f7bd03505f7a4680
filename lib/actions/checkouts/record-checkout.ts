"use server";
import { checkouts } from "@/db/schema";
import { findStandingCheckout, getActiveMember } from "@/db/queries/safety-checkouts";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { clubToday, fleetTypeGroupOrThrow } from "@/lib/actions/safety/bulletin-publishing";
import { compareIsoDates } from "@/lib/dates";
import { isClubMember } from "@/lib/safety/audience";
import { writeAudit } from "@/lib/server/audit";
import { recordCheckoutSchema } from "@/lib/validation/safety";

/** An instructor records that a member is checked out in a type group; the instructor is the signer. */
export const recordCheckout = clubAction({
  schema: recordCheckoutSchema,
  permission: ["create", "Checkout"],
  success: "Checkout recorded.",
  run(tx, ctx, input) {
    const { club, user } = ctx;
    const member = getActiveMember(tx, club.id, input.userId);
    if (!member || !isClubMember(member.roles)) throw new ActionError("Some fields need attention; nothing was saved.", { userId: ["Choose an active member of this club."] });
    if (input.userId === user.id) throw new ActionError("Some fields need attention; nothing was saved.", { userId: ["Another instructor has to record your own checkout."] });
    if (compareIsoDates(input.checkedOutOn, clubToday(ctx)) > 0) throw new ActionError("Some fields need attention; nothing was saved.", { checkedOutOn: ["The date cannot be in the future."] });
    const typeGroup = fleetTypeGroupOrThrow(tx, club.id, input.typeGroup, "typeGroup");
    const standing = findStandingCheckout(tx, club.id, input.userId, typeGroup);
    if (standing) {
      throw new ActionError(`This member is already checked out in ${typeGroup} since ${standing.checkedOutOn}. Revoke that checkout first to record a new one.`, { typeGroup: ["Already checked out in this group."] }, "conflict");
    }
    const [row] = tx
      .insert(checkouts)
      .values({ clubId: club.id, userId: input.userId, typeGroup, checkedOutOn: input.checkedOutOn, instructorId: user.id, instructorCertificateNumber: input.instructorCertificateNumber, conditions: input.conditions ?? null })
      .returning({ id: checkouts.id })
      .all();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "checkout.record", subjectType: "Checkout", subjectId: row!.id, after: { userId: input.userId, typeGroup, checkedOutOn: input.checkedOutOn, conditions: input.conditions ?? null } });
    return { refresh: true };
  },
});
