import { Button, Text } from "@react-email/components";
import { EmailLayout, buttonStyle } from "./layout";

export type BookingReminderProps = {
  clubName: string;
  personName: string;
  /** "Wednesday, Dec 9, 09:00–11:30 (club time, America/Chicago)". */
  when: string;
  registration: string;
  /** Who flies and who teaches, e.g. "You fly with Imani Ostrowski". */
  withWhom: string | null;
  url: string;
};

export function BookingReminderEmail({ clubName, personName, when, registration, withWhom, url }: BookingReminderProps) {
  return (
    <EmailLayout preview={`Tomorrow: ${registration}, ${when}`} title={`Tomorrow: ${registration}`} clubName={clubName}>
      <Text>Hello {personName},</Text>
      <Text>
        A reminder of your booking tomorrow: {registration}, {when}.{withWhom ? ` ${withWhom}.` : ""}
      </Text>
      <Text>If your plans have changed, cancel it so another member can fly. The aircraft&apos;s status is on the booking page; check it again before you go.</Text>
      <Button href={url} style={buttonStyle}>Open the booking</Button>
    </EmailLayout>
  );
}
