import { and, eq, isNull } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { bulletins, type Bulletin } from "@/db/schema";
import { audienceOf, getBulletin } from "@/db/queries/safety-bulletins";
import { listFleetTypeGroups } from "@/db/queries/safety-checkouts";
import { ActionError } from "@/lib/actions/action-state";
import { compareIsoDates, isoDateInTimeZone } from "@/lib/dates";
import { enqueueEmails } from "@/lib/email/outbox";
import { normalizeTypeGroup } from "@/lib/safety/audience";
import { URGENCY_LABELS } from "@/lib/safety/labels";
import { markdownToParagraphs } from "@/lib/safety/plain-text";
import { writeAudit } from "@/lib/server/audit";
import type { ClubContext } from "@/lib/server/club-context";
import { appUrl } from "@/lib/server/urls";

export function clubToday(ctx: Pick<ClubContext, "club">): string {
  return isoDateInTimeZone(new Date(), ctx.club.timeZone);
}

/** A deadline in the past would make every member overdue the moment it is published. */
export function assertDeadlineAhead(ctx: Pick<ClubContext, "club">, acknowledgeBy: string | undefined | null): void {
  if (acknowledgeBy && compareIsoDates(acknowledgeBy, clubToday(ctx)) < 0) {
    throw new ActionError("The acknowledgement deadline has passed; nothing was saved.", { acknowledgeBy: ["Choose today or a later date."] });
  }
}

/** The type group is spelled as the fleet spells it, so audience matching and the board agree. */
export function fleetTypeGroupOrThrow(tx: Tx, clubId: string, typeGroup: string | undefined, field: string): string {
  const groups = listFleetTypeGroups(tx, clubId);
  const match = groups.find((g) => normalizeTypeGroup(g) === normalizeTypeGroup(typeGroup ?? ""));
  if (!match) {
    throw new ActionError("That type group is not in the club's fleet; nothing was saved.", {
      [field]: [groups.length ? `Choose one of: ${groups.join(", ")}.` : "The club has no aircraft with a type group yet."],
    });
  }
  return match;
}

/**
 * Publishes a draft inside the caller's transaction: the earlier version (if this is a
 * revision) is marked superseded — its text is kept untouched — and one e-mail per audience
 * member is queued in the outbox.
 */
export function publishBulletinInTx(tx: Tx, ctx: ClubContext, draft: Bulletin): { recipients: number } {
  if (draft.status !== "draft") throw new ActionError("This bulletin is already published; issue a revision instead.", {}, "conflict");
  assertDeadlineAhead(ctx, draft.acknowledgeBy);
  const audience = audienceOf(tx, ctx.club.id, draft);
  if (audience.length === 0) {
    throw new ActionError("Nobody is in this audience yet, so nothing was published.", {
      audience: [draft.audience === "type_group" ? `No member holds a checkout in ${draft.audienceTypeGroup}.` : "No member matches this audience."],
    });
  }
  const now = new Date();
  let previous: Bulletin | undefined;
  if (draft.supersedesId) {
    previous = getBulletin(tx, ctx.club.id, draft.supersedesId);
    if (!previous || previous.status !== "published") throw new ActionError("The bulletin this revises was not found.", {}, "not_found");
    const marked = tx
      .update(bulletins)
      .set({ supersededAt: now, supersededById: draft.id })
      .where(and(eq(bulletins.clubId, ctx.club.id), eq(bulletins.id, previous.id), isNull(bulletins.supersededAt)))
      .run();
    if (marked.changes === 0) throw new ActionError(`Version ${previous.version} has already been replaced by another revision; revise the newest version instead.`, {}, "conflict");
  }
  const published = tx
    .update(bulletins)
    .set({ status: "published", publishedAt: now, publishedById: ctx.user.id })
    .where(and(eq(bulletins.clubId, ctx.club.id), eq(bulletins.id, draft.id), eq(bulletins.status, "draft")))
    .run();
  if (published.changes === 0) throw new ActionError("This bulletin was published in the meantime.", {}, "conflict");
  const url = appUrl(`/clubs/${ctx.club.slug}/safety/bulletins/${draft.id}`);
  const urgency = URGENCY_LABELS[draft.urgency];
  const paragraphs = markdownToParagraphs(draft.bodyMarkdown);
  enqueueEmails(
    tx,
    audience.map((person) => ({
      clubId: ctx.club.id,
      to: person.email,
      subject: `${urgency === "Routine" ? "" : `[${urgency}] `}Safety bulletin: ${draft.title}`,
      template: "bulletin" as const,
      payload: { clubName: ctx.club.name, title: draft.title, urgency, version: draft.version, supersedesVersion: previous?.version ?? null, paragraphs, acknowledgeBy: draft.acknowledgeBy, url },
    })),
  );
  writeAudit(tx, {
    clubId: ctx.club.id,
    actorId: ctx.user.id,
    action: "bulletin.publish",
    subjectType: "Bulletin",
    subjectId: draft.id,
    after: { version: draft.version, supersedes: previous?.id ?? null, audience: draft.audience, typeGroup: draft.audienceTypeGroup, recipients: audience.length },
  });
  return { recipients: audience.length };
}
