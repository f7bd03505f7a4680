import { Button, Text } from "@react-email/components";
import { EmailLayout, buttonStyle } from "./layout";

export type InvitationProps = { url: string; clubName: string; invitedBy: string; roles: string[]; expiresOn: string };

export function InvitationEmail({ url, clubName, invitedBy, roles, expiresOn }: InvitationProps) {
  return (
    <EmailLayout preview={`${invitedBy} invited you to ${clubName}`} title={`Join ${clubName}`} clubName={clubName}>
      <Text>{invitedBy} invited you to {clubName} on Hangarline as: {roles.join(", ")}.</Text>
      <Button href={url} style={buttonStyle}>Accept the invitation</Button>
      <Text style={{ fontSize: 13, color: "#5b6b73" }}>The invitation expires on {expiresOn}.</Text>
      <Text style={{ fontSize: 12, color: "#5b6b73", wordBreak: "break-all" }}>{url}</Text>
    </EmailLayout>
  );
}
