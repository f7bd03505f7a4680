// Operator accounts administer a chosen set of clubs: they create clubs, appoint each club's
// first admin and see cross-club summaries, never member-level detail.
export type OperatorScope = { userId: string; isOperator: boolean; clubIds: readonly string[] };

export function canUseOperatorConsole(scope: OperatorScope): boolean {
  return scope.isOperator;
}

export function canAdministerClub(scope: OperatorScope, clubId: string): boolean {
  return scope.isOperator && scope.clubIds.includes(clubId);
}

export function canCreateClub(scope: OperatorScope): boolean {
  return scope.isOperator;
}
