import { Button, Column, Link, Row, Section, Text } from "@react-email/components";
import { EmailLayout, buttonStyle } from "./layout";

/** Amounts arrive already formatted in the club's currency. */
export type StatementEmailProps = {
  clubName: string;
  memberName: string;
  periodLabel: string;
  opening: string;
  charges: string;
  credits: string;
  closing: string;
  balanceNow: string;
  owes: boolean;
  statementUrl: string;
  pdfUrl: string;
  payUrl: string;
};

const cell = { padding: "4px 0", fontSize: 14 };

export function StatementEmail(p: StatementEmailProps) {
  const rows: [string, string][] = [
    ["Brought forward", p.opening],
    ["Charges", p.charges],
    ["Payments and credits", p.credits],
    [`Balance at the end of ${p.periodLabel}`, p.closing],
  ];
  return (
    <EmailLayout preview={`Your ${p.periodLabel} statement: ${p.closing}`} title={`Statement for ${p.periodLabel}`} clubName={p.clubName}>
      <Text>Hello {p.memberName}, here is your account statement with {p.clubName}.</Text>
      <Section>
        {rows.map(([label, value]) => (
          <Row key={label}>
            <Column style={cell}>{label}</Column>
            <Column style={{ ...cell, textAlign: "right", fontFamily: "monospace" }}>{value}</Column>
          </Row>
        ))}
      </Section>
      <Text>
        Balance today, including anything posted since: <strong>{p.balanceNow}</strong>
        {p.owes ? "." : " — nothing to pay."}
      </Text>
      {p.owes ? <Button href={p.payUrl} style={buttonStyle}>Pay by card</Button> : null}
      <Text style={{ fontSize: 13 }}>
        <Link href={p.statementUrl}>See the statement online</Link> · <Link href={p.pdfUrl}>Download it as PDF</Link>
      </Text>
    </EmailLayout>
  );
}
