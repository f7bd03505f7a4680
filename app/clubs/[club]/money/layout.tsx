import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { requireClubContext } from "@/lib/server/club-context";

// The treasurer's area: only roles that read the club's ledger (treasurer, admin) come in.
export default async function MoneyLayout({ children, params }: { children: ReactNode; params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { ability } = await requireClubContext(slug);
  if (!ability.can("read", "Ledger")) notFound();
  return <div className="max-w-6xl">{children}</div>;
}
