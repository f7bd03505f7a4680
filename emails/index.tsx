import { render } from "@react-email/render";
import type { ReactElement } from "react";
import { InvitationEmail, type InvitationProps } from "./invitation";
import { MagicLinkEmail, type MagicLinkProps } from "./magic-link";
import { NoticeEmail, type NoticeProps } from "./notice";
import { GroundingNoticeEmail, type GroundingNoticeProps } from "./grounding-notice";
import { BulletinEmail, type BulletinProps } from "./bulletin";
import { BulletinReminderEmail, type BulletinReminderProps } from "./bulletin-reminder";
import { DocumentExpiryEmail, type DocumentExpiryProps } from "./document-expiry";
import { StatementEmail, type StatementEmailProps } from "./statement";
import { ReceiptEmail, type ReceiptEmailProps } from "./receipt";
import { DuesReminderEmail, type DuesReminderEmailProps } from "./dues-reminder";
import { SafetyDigestEmail, type SafetyDigestProps } from "./safety-digest";
import { SquawkAlertEmail, type SquawkAlertProps } from "./squawk-alert";
import { BookingReminderEmail, type BookingReminderProps } from "./booking-reminder";

// Every template the outbox can send, by name. A row stores the name and the props; the worker
// renders when it sends, so a template fix applies to messages still waiting.
export type EmailTemplates = {
  "magic-link": MagicLinkProps;
  invitation: InvitationProps;
  notice: NoticeProps;
  "grounding-notice": GroundingNoticeProps;
  bulletin: BulletinProps;
  "bulletin-reminder": BulletinReminderProps;
  "document-expiry": DocumentExpiryProps;
  statement: StatementEmailProps;
  receipt: ReceiptEmailProps;
  "dues-reminder": DuesReminderEmailProps;
  "safety-digest": SafetyDigestProps;
  "squawk-alert": SquawkAlertProps;
  "booking-reminder": BookingReminderProps;
};
export type EmailTemplateName = keyof EmailTemplates;

const components: { [K in EmailTemplateName]: (props: EmailTemplates[K]) => ReactElement } = {
  "magic-link": (p) => <MagicLinkEmail {...p} />,
  invitation: (p) => <InvitationEmail {...p} />,
  notice: (p) => <NoticeEmail {...p} />,
  "grounding-notice": (p) => <GroundingNoticeEmail {...p} />,
  bulletin: (p) => <BulletinEmail {...p} />,
  "bulletin-reminder": (p) => <BulletinReminderEmail {...p} />,
  "document-expiry": (p) => <DocumentExpiryEmail {...p} />,
  statement: (p) => <StatementEmail {...p} />,
  receipt: (p) => <ReceiptEmail {...p} />,
  "dues-reminder": (p) => <DuesReminderEmail {...p} />,
  "safety-digest": (p) => <SafetyDigestEmail {...p} />,
  "squawk-alert": (p) => <SquawkAlertEmail {...p} />,
  "booking-reminder": (p) => <BookingReminderEmail {...p} />,
};

export function isEmailTemplateName(name: string): name is EmailTemplateName {
  return name in components;
}

export async function renderEmail<K extends EmailTemplateName>(name: K, props: EmailTemplates[K]): Promise<{ html: string; text: string }> {
  const element = components[name](props);
  const [html, text] = await Promise.all([render(element), render(element, { plainText: true })]);
  return { html, text };
}
