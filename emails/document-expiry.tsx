import { Button, Text } from "@react-email/components";
import { EmailLayout, buttonStyle } from "./layout";

export type DocumentExpiryProps = { clubName: string; memberName: string; documentLabel: string; expiresOn: string; lapsed: boolean; url: string };

export function DocumentExpiryEmail({ clubName, memberName, documentLabel, expiresOn, lapsed, url }: DocumentExpiryProps) {
  return (
    <EmailLayout
      preview={lapsed ? `${documentLabel} lapsed on ${expiresOn}` : `${documentLabel} runs out on ${expiresOn}`}
      title={lapsed ? `${documentLabel}: lapsed` : `${documentLabel}: renew soon`}
      clubName={clubName}
    >
      <Text>Hello {memberName},</Text>
      <Text>
        {lapsed
          ? `Your ${documentLabel.toLowerCase()} on record with the club was valid until ${expiresOn}.`
          : `Your ${documentLabel.toLowerCase()} on record with the club is valid until ${expiresOn}.`}{" "}
        When you have renewed it, record the new one in Hangarline so your currency stays right.
      </Text>
      <Button href={url} style={buttonStyle}>Open my documents</Button>
    </EmailLayout>
  );
}
