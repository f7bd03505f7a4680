import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { listClubsForUser } from "@/db/queries/clubs";
import { authorizeSignedInPage } from "@/lib/server/authorize";
import { ROLE_LABELS } from "@/permissions";
import { SignOutButton } from "@/components/shell/sign-out-button";

export const metadata: Metadata = { title: "Your clubs" };

export default async function ClubsIndex() {
  // The signed-in person's own clubs only (listClubsForUser reads their active memberships).
  const user = await authorizeSignedInPage("/clubs");
  const clubs = listClubsForUser(getDb(), user.id);
  // An operator who is in no club of their own lands on the console they work from.
  if (user.platformRole === "operator" && clubs.length === 0) redirect("/operator");
  if (clubs.length === 1 && user.platformRole !== "operator") redirect(`/clubs/${clubs[0]!.slug}`);
  return (
    <main className="mx-auto max-w-2xl p-4 sm:p-8">
      <h1 className="text-2xl font-bold">Your clubs</h1>
      {/* An operator who is also in clubs chooses here: the console first, then their own clubs. */}
      {user.platformRole === "operator" ? (
        <section className="card mt-4 border-fin-600" aria-labelledby="console-h">
          <h2 id="console-h" className="text-lg font-bold"><Link href="/operator">Operator console</Link></h2>
          <p className="text-sm text-ink-700">The clubs you administer for the association: totals, admins and new clubs.</p>
        </section>
      ) : null}
      {clubs.length === 0 ? <p className="mt-3 text-ink-700">You are not in any club yet. A club admin can invite you.</p> : null}
      <ul className="mt-4 grid gap-3">
        {clubs.map((c) => (
          <li key={c.slug} className="card">
            <Link href={`/clubs/${c.slug}`} className="text-lg font-bold">{c.name}</Link>
            <p className="text-sm text-ink-500">{c.roles.map((r) => ROLE_LABELS[r]).join(" · ")}</p>
          </li>
        ))}
      </ul>
      <div className="mt-6 rounded bg-fin-700 p-2 inline-block"><SignOutButton /></div>
    </main>
  );
}
