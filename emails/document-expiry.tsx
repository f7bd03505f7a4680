import { Button, Text } from "@react-email/components";
import { EmailLayout, buttonStyle } from "./layout";

export type DocumentExpiryProps = { clubName: string; memberName: string; documentLabel: string; expiresOn: string; lapsed: boolean; url: string };

export function DocumentExpiryEmail({ clubName, memberName, documentLabel, expiresOn, lapsed, url }: DocumentExpiryProps) {
  return (
    <EmailLayout
      preview={lapsed ? `${documentLabel} expired on ${expiresOn}` : `${documentLabel} expires on ${expiresOn}`}
      title={lapsed ? `${documentLabel}: expired` : `${documentLabel}: renew soon`}
      clubName={clubName}
    >
      <Text>Hello {memberName},</Text>
      <Text>
        {lapsed
          ? `Your ${documentLabel.toLowerCase()} on record with the club expired on ${expiresOn}.`
          : `Your ${documentLabel.toLowerCase()} on record with the club expires on ${expiresOn}.`}{" "}
        When you have renewed it, record the new one in Hangarline so your currency stays right.
      </Text>
      <Button href={url} style={buttonStyle}>Open my documents</Button>
    </EmailLayout>
  );
}
