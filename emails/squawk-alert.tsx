import { Button, Text } from "@react-email/components";
import { EmailLayout, buttonStyle } from "./layout";

/** Sent at once when a squawk is reported as possibly making the aircraft unsafe: to maintenance,
 *  and to the members holding upcoming bookings on the aircraft. */
export type SquawkAlertProps = {
  clubName: string;
  registration: string;
  aircraftName: string;
  description: string;
  /** "preflight", "flight", "postflight" or "maintenance". */
  foundDuring: string;
  reportedBy: string;
  /** Why this person hears of it: they look after the aircraft, or they hold a booking on it. */
  because: "maintenance" | "booking";
  url: string;
  /** Ties the message to its squawk, so the report's confirmation can say who was e-mailed. */
  squawkId?: string;
};

export function SquawkAlertEmail({ clubName, registration, aircraftName, description, foundDuring, reportedBy, because, url }: SquawkAlertProps) {
  const title = `${registration}: reported as possibly unsafe`;
  return (
    <EmailLayout preview={`${registration}: ${description.slice(0, 90)}`} title={title} clubName={clubName}>
      <Text>
        {reportedBy} reported a squawk on {registration} ({aircraftName}), found during {foundDuring}, and marked it as possibly making the aircraft unsafe.
        Until maintenance looks at it, the flight line shows {registration} as grounded.
      </Text>
      <Text>
        <strong>What was found:</strong> {description}
      </Text>
      {because === "maintenance" ? (
        <Text>You hear of this because you look after the club&apos;s aircraft: please triage it.</Text>
      ) : (
        <Text>You hear of this because you hold an upcoming booking on {registration}. Check its status before you fly.</Text>
      )}
      <Button href={url} style={buttonStyle}>See the aircraft</Button>
    </EmailLayout>
  );
}
