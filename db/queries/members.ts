import "server-only";
import { and, desc, eq, isNull, gt } from "drizzle-orm";
import type { Db } from "@/db/client";
import { auditLog, invitations, memberships, users } from "@/db/schema";
import type { Role } from "@/permissions";

export type MemberRow = {
  membershipId: string;
  userId: string;
  name: string | null;
  email: string;
  roles: Role[];
  status: "active" | "inactive";
  joinedOn: string;
};

export function listMembers(db: Db, clubId: string): MemberRow[] {
  return db
    .select({
      membershipId: memberships.id,
      userId: users.id,
      name: users.name,
      email: users.email,
      roles: memberships.roles,
      status: memberships.status,
      joinedOn: memberships.joinedOn,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.clubId, clubId))
    .orderBy(users.name)
    .all();
}

export function getMember(db: Db, clubId: string, membershipId: string): MemberRow | undefined {
  return listMembersWhere(db, clubId, membershipId);
}

function listMembersWhere(db: Db, clubId: string, membershipId: string): MemberRow | undefined {
  return db
    .select({
      membershipId: memberships.id,
      userId: users.id,
      name: users.name,
      email: users.email,
      roles: memberships.roles,
      status: memberships.status,
      joinedOn: memberships.joinedOn,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.clubId, clubId), eq(memberships.id, membershipId)))
    .get();
}

export function listOpenInvitations(db: Db, clubId: string, now = new Date()) {
  return db
    .select({ id: invitations.id, email: invitations.email, roles: invitations.roles, expiresAt: invitations.expiresAt, createdAt: invitations.createdAt })
    .from(invitations)
    .where(and(eq(invitations.clubId, clubId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, now)))
    .orderBy(desc(invitations.createdAt))
    .all();
}

export function listAudit(db: Db, clubId: string, limit = 200) {
  return db
    .select({ id: auditLog.id, action: auditLog.action, subjectType: auditLog.subjectType, subjectId: auditLog.subjectId, before: auditLog.before, after: auditLog.after, createdAt: auditLog.createdAt, actorName: users.name, actorEmail: users.email })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorId))
    .where(eq(auditLog.clubId, clubId))
    .orderBy(desc(auditLog.createdAt))
    .limit(limit)
    .all();
}
