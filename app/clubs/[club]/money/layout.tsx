import type { ReactNode } from "react";
import { authorizePage } from "@/lib/server/authorize";

// The treasurer's area: only roles that read the club's ledger (treasurer, admin) come in.
// A courtesy only: a layout renders beside its page, so every page checks its own permission.
export default async function MoneyLayout({ children, params }: { children: ReactNode; params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  await authorizePage(slug, ["read", "Ledger"]);
  return <div className="max-w-6xl">{children}</div>;
}
