// What every filer of a safety report is told and where every filer lands, whichever kind of
// report it was: the answer must not say whether it was anonymous.
export const REPORT_FILED_MESSAGE = "Report filed. Thank you.";

export function reportFiledPath(slug: string): string {
  return `/clubs/${slug}/safety/reports?filed=1`;
}
