import { Button, Text } from "@react-email/components";
import { EmailLayout, buttonStyle } from "./layout";

/**
 * A published safety bulletin. The body goes out as plain paragraphs (no HTML is ever taken
 * from the Markdown); the full, formatted text and the acknowledge button are in Hangarline.
 */
export type BulletinProps = {
  clubName: string;
  title: string;
  urgency: string;
  version: number;
  supersedesVersion: number | null;
  paragraphs: string[];
  acknowledgeBy: string | null;
  url: string;
};

export function BulletinEmail({ clubName, title, urgency, version, supersedesVersion, paragraphs, acknowledgeBy, url }: BulletinProps) {
  return (
    <EmailLayout preview={`${urgency} safety bulletin: ${title}`} title={title} clubName={clubName}>
      <Text style={{ fontWeight: 700 }}>
        {urgency} safety bulletin{supersedesVersion ? ` · version ${version}, replaces version ${supersedesVersion}` : ""}
      </Text>
      {paragraphs.map((p, i) => (
        <Text key={i}>{p}</Text>
      ))}
      <Text>{acknowledgeBy ? `Please read it in full and acknowledge it by ${acknowledgeBy}.` : "Please read it in full and acknowledge it."}</Text>
      <Button href={url} style={buttonStyle}>Read and acknowledge</Button>
    </EmailLayout>
  );
}
