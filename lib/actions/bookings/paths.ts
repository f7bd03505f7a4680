/** Pages that show bookings and must be re-rendered after a change. */
export function bookingPaths(slug: string, bookingId?: string): string[] {
  const base = `/clubs/${slug}/bookings`;
  return [base, ...(bookingId ? [`${base}/${bookingId}`] : [])];
}
