import { Button, Text } from "@react-email/components";
import { EmailLayout, buttonStyle } from "./layout";

/** Sent to every member (booking holders first, once bookings exist) when an aircraft is grounded. */
export type GroundingNoticeProps = {
  clubName: string;
  registration: string;
  aircraftName: string;
  reason: string;
  /** Already in the club's time zone, e.g. "2026-05-01 14:00 (America/Chicago)". */
  effectiveAt: string;
  issuedBy: string;
  /** Why this person hears of it: a booking on the aircraft, or club membership. */
  because: "booking" | "member";
  url: string;
};

export function GroundingNoticeEmail({ clubName, registration, aircraftName, reason, effectiveAt, issuedBy, because, url }: GroundingNoticeProps) {
  const title = `${registration} is grounded`;
  return (
    <EmailLayout preview={`${registration} grounded: ${reason}`} title={title} clubName={clubName}>
      <Text>
        {registration} ({aircraftName}) is grounded from {effectiveAt}. Do not fly it until the notice is lifted.
      </Text>
      <Text>
        <strong>Reason:</strong> {reason}
      </Text>
      <Text>Issued by {issuedBy}.</Text>
      {because === "booking" ? <Text>You hear of this first because you hold a booking on this aircraft.</Text> : null}
      <Button href={url} style={buttonStyle}>See the aircraft</Button>
    </EmailLayout>
  );
}
