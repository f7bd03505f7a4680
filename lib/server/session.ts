import "server-only";
import { eq } from "drizzle-orm";
import { auth } from "@/auth";
import { getDb } from "@/db/client";
import { users, type User } from "@/db/schema";

export type SessionUser = Pick<User, "id" | "email" | "name" | "platformRole">;

/** The signed-in, active account, read fresh from the database (a disabled account has none). */
export async function getSessionUser(): Promise<SessionUser | null> {
  const session = await auth();
  const id = session?.user?.id;
  if (!id) return null;
  const user = getDb()
    .select({ id: users.id, email: users.email, name: users.name, platformRole: users.platformRole, disabledAt: users.disabledAt })
    .from(users)
    .where(eq(users.id, id))
    .get();
  if (!user || user.disabledAt) return null;
  return { id: user.id, email: user.email, name: user.name, platformRole: user.platformRole };
}
