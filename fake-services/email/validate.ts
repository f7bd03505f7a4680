// Validation of the e-mail provider's send-request body, answering with the provider's own
// error shape ({ statusCode, name, message }) so the SDK surfaces it unchanged.

export interface ProviderError {
  statusCode: number;
  name: string;
  message: string;
}

export interface ValidSendRequest {
  from: string;
  to: string[];
  cc: string[];
  bcc: string[];
  replyTo: string[];
  subject: string;
  html: string | null;
  text: string | null;
  headers: Record<string, string>;
  tags: { name: string; value: string }[];
}

const MAX_RECIPIENTS = 50;
const ADDRESS = /^[^\s@<>,;"]+@[^\s@<>,;"]+\.[^\s@<>,;"]+$/;
const NAMED_ADDRESS = /^(.*?)\s*<([^<>]+)>$/;

function missing(field: string): ProviderError {
  return { statusCode: 422, name: "missing_required_field", message: `Missing \`${field}\` field.` };
}

function invalid(message: string): ProviderError {
  return { statusCode: 422, name: "validation_error", message };
}

/** Bare address of "a@b.c" or "Name <a@b.c>"; null when neither form matches. */
export function extractAddress(value: string): string | null {
  const trimmed = value.trim();
  const named = NAMED_ADDRESS.exec(trimmed);
  const candidate = named ? (named[2] ?? "").trim() : trimmed;
  return ADDRESS.test(candidate) ? candidate : null;
}

function readAddressList(body: Record<string, unknown>, field: string, required: boolean): string[] | ProviderError {
  const raw = body[field];
  if (raw === undefined || raw === null) return required ? missing(field) : [];
  const list = typeof raw === "string" ? [raw] : raw;
  if (!Array.isArray(list) || list.some((v) => typeof v !== "string")) {
    return invalid(`Invalid \`${field}\` field. Expected a string or an array of strings.`);
  }
  const values = list as string[];
  if (required && values.length === 0) return missing(field);
  if (values.length > MAX_RECIPIENTS) return invalid(`Too many recipients in \`${field}\`: at most ${MAX_RECIPIENTS}.`);
  for (const v of values) {
    if (!extractAddress(v)) {
      return invalid(
        `Invalid \`${field}\` field. The email address needs to follow the \`email@example.com\` or \`Name <email@example.com>\` format.`,
      );
    }
  }
  return values;
}

function isError(v: unknown): v is ProviderError {
  return typeof v === "object" && v !== null && "statusCode" in v && "name" in v;
}

function readOptionalString(body: Record<string, unknown>, field: string): string | null | ProviderError {
  const v = body[field];
  if (v === undefined || v === null) return null;
  if (typeof v !== "string") return invalid(`Invalid \`${field}\` field. Expected a string.`);
  return v;
}

function readHeaders(raw: unknown): Record<string, string> | ProviderError {
  if (raw === undefined || raw === null) return {};
  if (typeof raw !== "object" || Array.isArray(raw)) return invalid("Invalid `headers` field. Expected an object.");
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(raw as Record<string, unknown>)) {
    if (typeof v !== "string") return invalid(`Invalid \`headers\` field. Header "${k}" must be a string.`);
    out[k] = v;
  }
  return out;
}

function readTags(raw: unknown): { name: string; value: string }[] | ProviderError {
  if (raw === undefined || raw === null) return [];
  if (!Array.isArray(raw)) return invalid("Invalid `tags` field. Expected an array.");
  const tags: { name: string; value: string }[] = [];
  for (const t of raw as unknown[]) {
    const tag = t as { name?: unknown; value?: unknown } | null;
    if (!tag || typeof tag.name !== "string" || typeof tag.value !== "string") {
      return invalid("Invalid `tags` field. Each tag needs a string `name` and `value`.");
    }
    tags.push({ name: tag.name, value: tag.value });
  }
  return tags;
}

export function validateSendRequest(body: unknown): ValidSendRequest | ProviderError {
  if (typeof body !== "object" || body === null || Array.isArray(body)) {
    return invalid("The request body must be a JSON object.");
  }
  const b = body as Record<string, unknown>;
  if (b.from === undefined || b.from === null || b.from === "") return missing("from");
  if (typeof b.from !== "string" || !extractAddress(b.from)) {
    return invalid(
      "Invalid `from` field. The email address needs to follow the `email@example.com` or `Name <email@example.com>` format.",
    );
  }
  const to = readAddressList(b, "to", true);
  if (isError(to)) return to;
  const cc = readAddressList(b, "cc", false);
  if (isError(cc)) return cc;
  const bcc = readAddressList(b, "bcc", false);
  if (isError(bcc)) return bcc;
  const replyTo = readAddressList(b, "reply_to", false);
  if (isError(replyTo)) return replyTo;
  if (b.subject === undefined || b.subject === null || b.subject === "") return missing("subject");
  if (typeof b.subject !== "string") return invalid("Invalid `subject` field. Expected a string.");
  const html = readOptionalString(b, "html");
  if (isError(html)) return html;
  const text = readOptionalString(b, "text");
  if (isError(text)) return text;
  if (!html && !text) return missing("html` or `text");
  const headers = readHeaders(b.headers);
  if (isError(headers)) return headers;
  const tags = readTags(b.tags);
  if (isError(tags)) return tags;
  return { from: b.from, to, cc, bcc, replyTo, subject: b.subject, html, text, headers, tags };
}

export function isProviderError(v: ValidSendRequest | ProviderError): v is ProviderError {
  return isError(v);
}
