import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { allows, explainDenied, type Permission } from "@/permissions";
import { resolveClubContext, type ClubContext } from "./club-context";

export type ApiErrorCode = "unauthenticated" | "forbidden" | "not_found" | "invalid" | "conflict" | "unprocessable";
const STATUS: Record<ApiErrorCode, number> = { unauthenticated: 401, forbidden: 403, not_found: 404, invalid: 400, conflict: 409, unprocessable: 422 };

export function apiError(code: ApiErrorCode, message: string, fields?: Record<string, string[]>) {
  return NextResponse.json({ error: { code, message, ...(fields ? { fields } : {}) } }, { status: STATUS[code] });
}

/**
 * Route handlers: the same session → club → membership → ability path as pages and actions.
 * The permission goes through the one helper (permissions/authorize.ts): a type-level pair is
 * refused for conditional subjects; a refused type or "all" question answers 403 with the reason,
 * a refused record question answers 404 exactly like a missing record. `null` means the handler
 * checks the record itself (with authorized(ctx, [action, Type, record])) once it has read it.
 */
export async function withClub(
  slug: string,
  permission: Permission | null,
  handler: (ctx: ClubContext) => Promise<Response> | Response,
): Promise<Response> {
  const resolved = await resolveClubContext(slug);
  if (!resolved.ok) {
    return resolved.code === "unauthenticated" ? apiError("unauthenticated", "Sign in first.") : apiError("not_found", "Not found.");
  }
  if (permission && !allows(resolved.ctx.ability, permission)) {
    if (permission[2] !== undefined && permission[2] !== "all") return apiError("not_found", "Not found.");
    return apiError("forbidden", explainDenied(permission[0], permission[1]));
  }
  return handler(resolved.ctx);
}

export function zodToFields(error: z.ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) (out[issue.path.join(".") || "_form"] ??= []).push(issue.message);
  return out;
}
