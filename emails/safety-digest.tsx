import { Button, Link, Text } from "@react-email/components";
import { EmailLayout, buttonStyle } from "./layout";

/**
 * The safety officers' daily digest of new reports. It names whole club days only and never a
 * reporter: the days covered, how many arrived, and a link to each.
 */
export type SafetyDigestProps = {
  clubName: string;
  fromDay: string;
  toDay: string;
  count: number;
  anonymousCount: number;
  reports: { url: string; occurredOn: string }[];
  listUrl: string;
};

export function SafetyDigestEmail({ clubName, fromDay, toDay, count, anonymousCount, reports, listUrl }: SafetyDigestProps) {
  const days = fromDay === toDay ? `on ${toDay}` : `from ${fromDay} to ${toDay}`;
  const summary = `${count} new safety ${count === 1 ? "report was" : "reports were"} received ${days}${anonymousCount ? ` (${anonymousCount} filed anonymously)` : ""}.`;
  return (
    <EmailLayout preview={summary} title="New safety reports" clubName={clubName}>
      <Text>{summary} Read and triage them in Hangarline.</Text>
      {reports.map((r) => (
        <Text key={r.url}>
          <Link href={r.url}>Report of an event on {r.occurredOn}</Link>
        </Text>
      ))}
      <Button href={listUrl} style={buttonStyle}>Open the reports</Button>
    </EmailLayout>
  );
}
