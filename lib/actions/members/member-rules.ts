import { and, eq, ne } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { memberships } from "@/db/schema";
import { ActionError } from "@/lib/actions/action-state";

/** A club always keeps at least one active admin, so nobody can lock the club out. */
export function assertAnotherActiveAdmin(tx: Tx, clubId: string, exceptMembershipId: string): void {
  const others = tx
    .select({ roles: memberships.roles })
    .from(memberships)
    .where(and(eq(memberships.clubId, clubId), eq(memberships.status, "active"), ne(memberships.id, exceptMembershipId)))
    .all();
  if (!others.some((m) => m.roles.includes("admin"))) {
    throw new ActionError("This is the club's last active admin. Make someone else an admin first.");
  }
}
