import { Body, Container, Head, Heading, Hr, Html, Preview, Section, Text } from "@react-email/components";
import type { ReactNode } from "react";

const page = { backgroundColor: "#f3f1ea", fontFamily: "Helvetica, Arial, sans-serif", color: "#1d2a33" };
const card = { backgroundColor: "#ffffff", border: "1px solid #d9d4c5", borderRadius: 6, padding: "24px 28px", maxWidth: 560 };

export function EmailLayout({ preview, title, clubName, children }: { preview: string; title: string; clubName?: string; children: ReactNode }) {
  return (
    <Html lang="en">
      <Head />
      <Preview>{preview}</Preview>
      <Body style={page}>
        <Container style={card}>
          <Text style={{ fontSize: 12, letterSpacing: 2, textTransform: "uppercase", color: "#5b6b73", margin: 0 }}>
            Hangarline{clubName ? ` · ${clubName}` : ""}
          </Text>
          <Heading as="h1" style={{ fontSize: 22, margin: "12px 0 16px" }}>{title}</Heading>
          <Section>{children}</Section>
          <Hr style={{ borderColor: "#d9d4c5", margin: "24px 0 12px" }} />
          <Text style={{ fontSize: 12, color: "#5b6b73", margin: 0 }}>
            You receive this message because of your account on Hangarline. The pilot in command decides
            whether an aircraft is airworthy before every flight.
          </Text>
        </Container>
      </Body>
    </Html>
  );
}

export const buttonStyle = {
  backgroundColor: "#1f4e5f",
  color: "#ffffff",
  padding: "10px 18px",
  borderRadius: 4,
  textDecoration: "none",
  fontWeight: 700,
};
