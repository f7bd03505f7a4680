import { Button, Text } from "@react-email/components";
import { EmailLayout, buttonStyle } from "./layout";

export type MagicLinkProps = { url: string; expiresMinutes: number };

export function MagicLinkEmail({ url, expiresMinutes }: MagicLinkProps) {
  return (
    <EmailLayout preview="Your sign-in link for Hangarline" title="Sign in to Hangarline">
      <Text>Use the button below to sign in. The link works once and expires in {expiresMinutes} minutes.</Text>
      <Button href={url} style={buttonStyle}>Sign in</Button>
      <Text style={{ fontSize: 13, color: "#5b6b73" }}>If you did not ask for this, you can ignore this message.</Text>
      <Text style={{ fontSize: 12, color: "#5b6b73", wordBreak: "break-all" }}>{url}</Text>
    </EmailLayout>
  );
}
