import { Button, Text } from "@react-email/components";
import { EmailLayout, buttonStyle } from "./layout";

export type BulletinReminderProps = { clubName: string; title: string; urgency: string; acknowledgeBy: string | null; publishedOn: string; url: string };

export function BulletinReminderEmail({ clubName, title, urgency, acknowledgeBy, publishedOn, url }: BulletinReminderProps) {
  return (
    <EmailLayout preview={`Reminder: please acknowledge "${title}"`} title={`Reminder: ${title}`} clubName={clubName}>
      <Text>
        The safety officer asks you to read and acknowledge the {urgency.toLowerCase()} bulletin &ldquo;{title}&rdquo;, published on {publishedOn}.
        {acknowledgeBy ? ` The deadline is ${acknowledgeBy}.` : ""}
      </Text>
      <Button href={url} style={buttonStyle}>Read and acknowledge</Button>
    </EmailLayout>
  );
}
