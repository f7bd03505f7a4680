import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { explainDenied, type Action, type SubjectName } from "@/permissions";
import { resolveClubContext, type ClubContext } from "./club-context";

export type ApiErrorCode = "unauthenticated" | "forbidden" | "not_found" | "invalid" | "conflict" | "unprocessable";
const STATUS: Record<ApiErrorCode, number> = { unauthenticated: 401, forbidden: 403, not_found: 404, invalid: 400, conflict: 409, unprocessable: 422 };

export function apiError(code: ApiErrorCode, message: string, fields?: Record<string, string[]>) {
  return NextResponse.json({ error: { code, message, ...(fields ? { fields } : {}) } }, { status: STATUS[code] });
}

/** Route handlers: the same session → club → membership → ability path as pages and actions. */
export async function withClub(
  slug: string,
  permission: [Action, SubjectName] | null,
  handler: (ctx: ClubContext) => Promise<Response> | Response,
): Promise<Response> {
  const resolved = await resolveClubContext(slug);
  if (!resolved.ok) {
    return resolved.code === "unauthenticated" ? apiError("unauthenticated", "Sign in first.") : apiError("not_found", "Not found.");
  }
  if (permission && !resolved.ctx.ability.can(permission[0], permission[1])) {
    return apiError("forbidden", explainDenied(permission[0], permission[1]));
  }
  return handler(resolved.ctx);
}

export function zodToFields(error: z.ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) (out[issue.path.join(".") || "_form"] ??= []).push(issue.message);
  return out;
}
