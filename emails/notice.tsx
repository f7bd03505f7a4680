import { Button, Text } from "@react-email/components";
import { EmailLayout, buttonStyle } from "./layout";

/** A plain club notice: paragraphs and an optional link. Later features add templates of their own. */
export type NoticeProps = { title: string; clubName?: string; paragraphs: string[]; actionUrl?: string; actionLabel?: string };

export function NoticeEmail({ title, clubName, paragraphs, actionUrl, actionLabel }: NoticeProps) {
  return (
    <EmailLayout preview={paragraphs[0] ?? title} title={title} clubName={clubName}>
      {paragraphs.map((p, i) => (
        <Text key={i}>{p}</Text>
      ))}
      {actionUrl ? <Button href={actionUrl} style={buttonStyle}>{actionLabel ?? "Open Hangarline"}</Button> : null}
    </EmailLayout>
  );
}
