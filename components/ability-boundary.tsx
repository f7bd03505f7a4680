"use client";
import { AbilityProvider, useAbility } from "@casl/react";
import { useMemo, type ReactNode } from "react";
import { defineAbilityFor, explainDenied, type Action, type AppAbility, type Role, type SubjectName } from "@/permissions";

// The same permission table as the server, rebuilt in the browser to hide or disable controls.
// The server checks again on every request.
export function AbilityBoundary({ userId, roles, children }: { userId: string; roles: Role[]; children: ReactNode }) {
  const ability = useMemo(() => defineAbilityFor({ userId, roles }), [userId, roles]);
  return <AbilityProvider value={ability}>{children}</AbilityProvider>;
}

export function useClubAbility(): AppAbility {
  return useAbility<AppAbility>();
}

/** Renders children when allowed; otherwise the reason, in words, unless hidden. */
export function Allowed({ action, subject, children, hide = false }: { action: Action; subject: SubjectName; children: ReactNode; hide?: boolean }) {
  const ability = useClubAbility();
  if (ability.can(action, subject)) return <>{children}</>;
  if (hide) return null;
  return <p className="text-sm text-ink-500" data-denied={`${action}:${subject}`}>{explainDenied(action, subject)}</p>;
}
