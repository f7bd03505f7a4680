// The fake's hosted payment page at /pay/:sessionId, where a member's browser lands from a
// checkout session's `url`. Its look and wording are our own. A successful card redirects to
// the session's success_url once the resulting webhooks have been delivered, so the app has
// heard about the payment before the member's browser comes back.
import type { IncomingMessage, ServerResponse } from "node:http";
import { escapeHtml, readBody, sendHtml, sendRedirect } from "../shared/http";
import { paySession, expireIfDue, type PayOutcome } from "./checkout";
import type { CheckoutSession, LineItem, PaymentsStore } from "./store";
import type { EventBus } from "./webhooks";

export function formatMinor(amount: number, currency: string): string {
  try {
    const fmt = new Intl.NumberFormat("en", { style: "currency", currency: currency.toUpperCase() });
    const digits = fmt.resolvedOptions().maximumFractionDigits ?? 2;
    return fmt.format(amount / 10 ** digits);
  } catch {
    return `${amount} ${currency.toUpperCase()} (minor units)`;
  }
}

const STYLES = `
*{box-sizing:border-box}
body{margin:0;min-height:100vh;font:15px/1.5 system-ui,-apple-system,"Segoe UI",Roboto,sans-serif;color:#1b2530;background:linear-gradient(160deg,#e7edf2,#f7f4ee)}
.wrap{max-width:860px;margin:0 auto;padding:40px 16px}
.tag{display:inline-block;font-size:12px;letter-spacing:.06em;text-transform:uppercase;color:#7a4b12;background:#fbe9cf;border:1px solid #efcf9f;border-radius:999px;padding:2px 10px;margin-bottom:14px}
.panel{display:grid;grid-template-columns:1fr 1fr;background:#fff;border:1px solid #d5dbe2;border-radius:14px;overflow:hidden;box-shadow:0 8px 30px rgba(25,40,60,.08)}
@media (max-width:720px){.panel{grid-template-columns:1fr}}
.order{background:#f4f6f8;padding:26px;border-right:1px solid #e1e5ea}
.order h1{font-size:15px;margin:0 0 4px;color:#4d5967;font-weight:600}
.total{font-size:30px;font-weight:700;margin:0 0 18px;font-variant-numeric:tabular-nums}
.items{list-style:none;margin:0;padding:0}
.items li{display:flex;justify-content:space-between;gap:12px;padding:8px 0;border-top:1px dashed #cfd6de}
.items .qty{color:#6a7683;font-size:13px}
.pay{padding:26px}
label{display:block;font-size:13px;font-weight:600;color:#36424f;margin:12px 0 4px}
input{width:100%;font:inherit;padding:9px 11px;border:1px solid #b9c3ce;border-radius:8px;background:#fff}
input:focus{outline:2px solid #2f6f9f;outline-offset:1px;border-color:#2f6f9f}
.row{display:grid;grid-template-columns:1fr 1fr;gap:12px}
button{margin-top:20px;width:100%;font:inherit;font-weight:700;padding:12px;border:0;border-radius:8px;background:#24577f;color:#fff;cursor:pointer}
button:hover{background:#1c4666}
.error{margin:0 0 8px;padding:10px 12px;border-radius:8px;background:#fdeceb;border:1px solid #f0b8b3;color:#8a1f16}
.error::before{content:"\\2716  "}
.cancel{display:block;text-align:center;margin-top:14px;font-size:14px;color:#4d5967}
.fine{font-size:12px;color:#6a7683;margin-top:18px}
.notice{background:#fff;border:1px solid #d5dbe2;border-radius:14px;padding:30px;text-align:center}
`;

function layout(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>${escapeHtml(title)}</title><style>${STYLES}</style></head><body><div class="wrap">
<span class="tag">Test-mode stand-in &middot; no real card is charged</span>${body}</div></body></html>`;
}

interface FormState {
  number?: string;
  expiry?: string;
  name?: string;
  email?: string;
}

function renderPayPage(session: CheckoutSession, items: LineItem[], error: string | null, form: FormState): string {
  const total = formatMinor(session.amount_total, session.currency);
  const list = items
    .map(
      (li) =>
        `<li><span>${escapeHtml(li.description)} <span class="qty">&times; ${li.quantity}</span></span><span>${escapeHtml(formatMinor(li.amount_total, li.currency))}</span></li>`,
    )
    .join("");
  const askEmail = !session.customer_email && !session.customer;
  const v = (s: string | undefined) => escapeHtml(s ?? "");
  const cancel = session.cancel_url ? `<a class="cancel" href="${escapeHtml(session.cancel_url)}">Cancel and go back</a>` : "";
  return layout(
    `Pay ${total}`,
    `<div class="panel"><section class="order"><h1>Amount due</h1><p class="total" data-testid="total">${escapeHtml(total)}</p>
<ul class="items">${list}</ul></section>
<section class="pay"><form method="post" action="/pay/${encodeURIComponent(session.id)}" novalidate>
${error ? `<p class="error" role="alert">${escapeHtml(error)}</p>` : ""}
${askEmail ? `<label for="email">E-mail for the receipt</label><input id="email" name="email" type="email" autocomplete="email" value="${v(form.email)}">` : ""}
<label for="card_number">Card number</label><input id="card_number" name="card_number" inputmode="numeric" autocomplete="cc-number" placeholder="1234 1234 1234 1234" value="${v(form.number)}">
<div class="row"><div><label for="expiry">Expiry (MM/YY)</label><input id="expiry" name="expiry" autocomplete="cc-exp" placeholder="MM/YY" value="${v(form.expiry)}"></div>
<div><label for="cvc">Security code</label><input id="cvc" name="cvc" inputmode="numeric" autocomplete="cc-csc" placeholder="CVC"></div></div>
<label for="name">Name on card</label><input id="name" name="name" autocomplete="cc-name" value="${v(form.name)}">
<button type="submit">Pay ${escapeHtml(total)}</button>${cancel}
<p class="fine">This page belongs to a local stand-in for the card-payment provider. Use the provider's published test card numbers.</p>
</form></section></div>`,
  );
}

function renderNotice(title: string, text: string, link?: { href: string; label: string }): string {
  const a = link ? `<p><a href="${escapeHtml(link.href)}">${escapeHtml(link.label)}</a></p>` : "";
  return layout(title, `<div class="notice"><h1>${escapeHtml(title)}</h1><p>${escapeHtml(text)}</p>${a}</div>`);
}

export function successRedirect(session: CheckoutSession): string | null {
  return session.success_url ? session.success_url.replace(/\{CHECKOUT_SESSION_ID\}/g, session.id) : null;
}

export async function handleHostedPage(
  req: IncomingMessage,
  res: ServerResponse,
  sessionId: string,
  deps: { store: PaymentsStore; bus: EventBus },
): Promise<void> {
  const session = deps.store.find("checkout.session", sessionId);
  if (!session) return sendHtml(res, 404, renderNotice("Payment page not found", "This payment link is not valid."));
  expireIfDue(session, deps.bus);
  const items = deps.store.lineItems.get(session.id) ?? [];
  const done = successRedirect(session);
  if (session.status === "complete") {
    return sendHtml(res, 200, renderNotice("Payment complete", "This payment has already been made.", done ? { href: done, label: "Continue" } : undefined));
  }
  if (session.status === "expired") {
    const back = session.cancel_url ? { href: session.cancel_url, label: "Go back" } : undefined;
    return sendHtml(res, 410, renderNotice("Payment page expired", "Start the payment again from the club portal.", back));
  }
  if (req.method === "GET") return sendHtml(res, 200, renderPayPage(session, items, null, {}));
  if (req.method !== "POST") return sendHtml(res, 405, renderNotice("Not allowed", "Use the form on this page."));

  const form = new URLSearchParams(await readBody(req, 100_000));
  const state: FormState = {
    number: form.get("card_number") ?? "",
    expiry: form.get("expiry") ?? "",
    name: form.get("name") ?? "",
    email: form.get("email") ?? "",
  };
  const outcome: PayOutcome = paySession(deps.store, deps.bus, session.id, {
    number: state.number ?? "",
    expiry: state.expiry ?? "",
    cvc: form.get("cvc") ?? "",
    name: state.name,
    email: state.email,
  });
  await deps.bus.flush();
  if (outcome.ok) {
    const target = successRedirect(outcome.session);
    if (target) return sendRedirect(res, target);
    return sendHtml(res, 200, renderNotice("Payment received", "Thank you. You can close this page."));
  }
  const status = outcome.kind === "declined" ? 402 : 400;
  return sendHtml(res, status, renderPayPage(session, items, outcome.message, state));
}
