// Adapter around the e-mail provider's SDK. The outbox worker calls send() and decides from
// `retryable` whether to try the row again later, so send() never throws.
//
// Base URL: the SDK constructor accepts `{ baseUrl }` (resend 6.x); when it is not given the
// SDK itself falls back to process.env.RESEND_BASE_URL and then to the hosted API. Local runs
// and tests point it at fake-services/email.
import { Resend } from "resend";

export interface EmailMessage {
  from: string;
  to: string | string[];
  subject: string;
  html: string;
  text?: string;
  headers?: Record<string, string>;
}

export type SendResult = { ok: true; providerId: string } | { ok: false; error: string; retryable: boolean };

export interface SendOptions {
  /** Lets a retried outbox row reuse its key so the provider sends it at most once. */
  idempotencyKey?: string;
}

export interface EmailProvider {
  send(msg: EmailMessage, options?: SendOptions): Promise<SendResult>;
}

interface SdkError {
  statusCode?: number | null;
  name?: string;
  message?: string;
}

// Names the SDK or provider use for conditions that clear up by themselves.
const RETRYABLE_NAMES = new Set([
  "application_error",
  "internal_server_error",
  "rate_limit_exceeded",
  "daily_quota_exceeded",
  "concurrent_idempotent_requests",
]);

/** Network failures (no status), 408, 429 and 5xx are worth another try; other 4xx are not. */
export function isRetryableEmailError(error: SdkError): boolean {
  const status = error.statusCode;
  if (status === null || status === undefined) return true;
  if (status === 408 || status === 429 || status >= 500) return true;
  if (status >= 400) return false;
  return RETRYABLE_NAMES.has(error.name ?? "");
}

function describeError(error: SdkError): string {
  const status = error.statusCode ?? "network";
  return `${error.name ?? "error"} (${status}): ${error.message ?? "no message"}`;
}

export function createEmailProvider(opts: { apiKey?: string; baseUrl?: string } = {}): EmailProvider {
  const apiKey = opts.apiKey ?? process.env.RESEND_API_KEY ?? "";
  // The SDK throws on a missing key; keep that as a send() result so the worker records it.
  const client = apiKey ? new Resend(apiKey, opts.baseUrl ? { baseUrl: opts.baseUrl } : undefined) : null;

  return {
    async send(msg, options = {}) {
      if (!client) return { ok: false, error: "missing_api_key: no e-mail provider API key configured", retryable: false };
      try {
        const { data, error } = await client.emails.send(
          {
            from: msg.from,
            to: msg.to,
            subject: msg.subject,
            html: msg.html,
            ...(msg.text !== undefined ? { text: msg.text } : {}),
            ...(msg.headers ? { headers: msg.headers } : {}),
          },
          options.idempotencyKey ? { idempotencyKey: options.idempotencyKey } : {},
        );
        if (error) return { ok: false, error: describeError(error), retryable: isRetryableEmailError(error) };
        if (!data?.id) return { ok: false, error: "provider answered without a message id", retryable: true };
        return { ok: true, providerId: data.id };
      } catch (err) {
        // The SDK reports most failures as values; anything thrown is treated as transient.
        return { ok: false, error: `unexpected: ${err instanceof Error ? err.message : String(err)}`, retryable: true };
      }
    },
  };
}
