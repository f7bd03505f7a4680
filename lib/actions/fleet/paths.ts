/** Pages that show fleet records and must be re-rendered after a change. */
export function fleetPaths(slug: string, aircraftId?: string): string[] {
  const base = `/clubs/${slug}`;
  return [`${base}/flight-line`, `${base}/maintenance`, `${base}/flights`, `${base}/aircraft`, ...(aircraftId ? [`${base}/aircraft/${aircraftId}`] : [])];
}
