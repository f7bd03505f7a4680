// Words for what a squawk report did: only what happened, never "maintenance has been told"
// when nobody was.

function people(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

/** "maintenance (2 people) and 1 member holding a booking on it were e-mailed", or null when nobody was. */
export function toldText(maintenance: number, booking: number): string | null {
  const m = Number.isInteger(maintenance) && maintenance > 0 ? maintenance : 0;
  const b = Number.isInteger(booking) && booking > 0 ? booking : 0;
  const parts: string[] = [];
  if (m) parts.push(`maintenance (${people(m, "person", "people")})`);
  if (b) parts.push(people(b, "member holding a booking on it", "members holding bookings on it"));
  if (parts.length === 0) return null;
  return `${parts.join(" and ")} ${m + b === 1 ? "was" : "were"} e-mailed`;
}
