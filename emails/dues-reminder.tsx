import { Button, Text } from "@react-email/components";
import { EmailLayout, buttonStyle } from "./layout";

export type DuesReminderEmailProps = {
  clubName: string;
  memberName: string;
  balance: string;
  overdue: string;
  oldestDueDate: string;
  payUrl: string;
};

export function DuesReminderEmail(p: DuesReminderEmailProps) {
  return (
    <EmailLayout preview={`${p.overdue} is overdue`} title="A friendly reminder about your account" clubName={p.clubName}>
      <Text>Hello {p.memberName}, {p.overdue} on your account with {p.clubName} is overdue; the oldest item fell due on {p.oldestDueDate}.</Text>
      <Text>Your balance is {p.balance}. If you have paid in the last few days, thank you, and please ignore this message.</Text>
      <Button href={p.payUrl} style={buttonStyle}>See your account and pay</Button>
    </EmailLayout>
  );
}
