import Link from "next/link";
import { notFound, redirect } from "next/navigation";
import type { ReactNode } from "react";
import { SignOutButton } from "@/components/shell/sign-out-button";
import { getSessionUser } from "@/lib/server/session";

export default async function OperatorLayout({ children }: { children: ReactNode }) {
  const user = await getSessionUser();
  if (!user) redirect("/sign-in?callbackUrl=/operator");
  if (user.platformRole !== "operator") notFound();
  return (
    <div className="min-h-dvh">
      <header className="flex flex-wrap items-center justify-between gap-2 bg-fin-900 px-4 py-3 text-white">
        <Link href="/operator" className="font-bold text-white no-underline">Hangarline · Operator console</Link>
        <nav aria-label="Operator" className="flex items-center gap-3 text-sm">
          <Link href="/operator" className="text-sand-50">Clubs</Link>
          <Link href="/operator/clubs/new" className="text-sand-50">New club</Link>
          <Link href="/clubs" className="text-sand-50">My memberships</Link>
          <SignOutButton />
        </nav>
      </header>
      <main className="mx-auto max-w-6xl px-4 py-6">{children}</main>
    </div>
  );
}
