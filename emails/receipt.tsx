import { Text } from "@react-email/components";
import { EmailLayout } from "./layout";

export type ReceiptEmailProps = {
  clubName: string;
  memberName: string;
  amount: string;
  method: string;
  receivedOn: string;
  reference?: string | null;
  balanceNow: string;
  accountUrl: string;
};

export function ReceiptEmail(p: ReceiptEmailProps) {
  return (
    <EmailLayout preview={`We received ${p.amount}`} title={`Payment received: ${p.amount}`} clubName={p.clubName}>
      <Text>Hello {p.memberName}, thank you: {p.clubName} received your payment.</Text>
      <Text>
        Amount: <strong>{p.amount}</strong>
        <br />
        Paid by: {p.method}
        <br />
        Date: {p.receivedOn}
        {p.reference ? (
          <>
            <br />
            Reference: {p.reference}
          </>
        ) : null}
      </Text>
      <Text>Your balance is now {p.balanceNow}. Your account page: {p.accountUrl}</Text>
    </EmailLayout>
  );
}
