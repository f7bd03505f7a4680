// The payment provider's error body is { error: { type, code, message, param, ... } }; the SDK
// picks its typed error class from the HTTP status (400/404 invalid request, 401
// authentication, 402 card, 403 permission, 429 rate limit, other API error).

export interface ApiErrorDetails {
  code?: string;
  param?: string;
  decline_code?: string;
  payment_intent?: unknown;
}

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly type: string,
    message: string,
    readonly details: ApiErrorDetails = {},
  ) {
    super(message);
  }

  toBody(): { error: Record<string, unknown> } {
    return { error: { type: this.type, message: this.message, ...this.details } };
  }
}

const KIND_NAMES: Record<string, string> = {
  cus: "customer",
  cs: "checkout.session",
  pi: "payment_intent",
  ch: "charge",
  re: "refund",
  txn: "balance transaction",
  po: "payout",
  evt: "event",
};

/** "No such customer: 'cus_x'", 404 on the resource's own path, 400 when named by a param. */
export function noSuch(id: string, param?: string): ApiError {
  const prefix = id.startsWith("cs_") ? "cs" : (id.split("_")[0] ?? "");
  const kind = KIND_NAMES[prefix] ?? "object";
  return new ApiError(param ? 400 : 404, "invalid_request_error", `No such ${kind}: '${id}'`, {
    code: "resource_missing",
    ...(param ? { param } : {}),
  });
}

export function invalidRequest(message: string, param?: string, code?: string): ApiError {
  return new ApiError(400, "invalid_request_error", message, {
    ...(code ? { code } : {}),
    ...(param ? { param } : {}),
  });
}
