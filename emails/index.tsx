import { render } from "@react-email/render";
import type { ReactElement } from "react";
import { InvitationEmail, type InvitationProps } from "./invitation";
import { MagicLinkEmail, type MagicLinkProps } from "./magic-link";
import { NoticeEmail, type NoticeProps } from "./notice";

// Every template the outbox can send, by name. A row stores the name and the props; the worker
// renders when it sends, so a template fix applies to messages still waiting.
export type EmailTemplates = {
  "magic-link": MagicLinkProps;
  invitation: InvitationProps;
  notice: NoticeProps;
};
export type EmailTemplateName = keyof EmailTemplates;

const components: { [K in EmailTemplateName]: (props: EmailTemplates[K]) => ReactElement } = {
  "magic-link": (p) => <MagicLinkEmail {...p} />,
  invitation: (p) => <InvitationEmail {...p} />,
  notice: (p) => <NoticeEmail {...p} />,
};

export function isEmailTemplateName(name: string): name is EmailTemplateName {
  return name in components;
}

export async function renderEmail<K extends EmailTemplateName>(name: K, props: EmailTemplates[K]): Promise<{ html: string; text: string }> {
  const element = components[name](props);
  const [html, text] = await Promise.all([render(element), render(element, { plainText: true })]);
  return { html, text };
}
