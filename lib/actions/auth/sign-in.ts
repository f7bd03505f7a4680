"use server";
import { AuthError, CredentialsSignin } from "next-auth";
import { signIn } from "@/auth";
import { zodFieldErrors } from "@/lib/actions/create-action";
import type { ActionState } from "@/lib/actions/action-state";
import { magicLinkSchema, passwordSignInSchema, safeCallbackUrl } from "@/lib/validation/auth";

const GENERIC = "That e-mail and password do not match an active account.";
const LIMITED = "Too many failed sign-ins. Wait a few minutes and try again (each further failure makes the wait longer), or use an e-mail link instead.";

export async function signInWithPassword(_prev: ActionState, formData: FormData): Promise<ActionState> {
  const parsed = passwordSignInSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return { ok: false, message: "Check the highlighted fields.", fieldErrors: zodFieldErrors(parsed.error) };
  const to = safeCallbackUrl(parsed.data.callbackUrl ?? "/clubs");
  try {
    // No redirect from here (DEVELOPERS.md "Forms and their answers"): the answer says where to go.
    await signIn("credentials", { email: parsed.data.email, password: parsed.data.password, redirect: false });
  } catch (error) {
    if (error instanceof CredentialsSignin) {
      return { ok: false, message: error.code === "rate_limited" ? LIMITED : GENERIC, fieldErrors: {} };
    }
    if (error instanceof AuthError) return { ok: false, message: GENERIC, fieldErrors: {} };
    throw error;
  }
  return { ok: true, message: "Signed in.", fieldErrors: {}, redirectTo: to };
}

export async function requestMagicLink(_prev: ActionState, formData: FormData): Promise<ActionState> {
  const parsed = magicLinkSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return { ok: false, message: "Check the highlighted fields.", fieldErrors: zodFieldErrors(parsed.error) };
  try {
    await signIn("email", { email: parsed.data.email, redirectTo: safeCallbackUrl(parsed.data.callbackUrl ?? "/clubs"), redirect: false });
  } catch (error) {
    if (error instanceof AuthError) {
      return { ok: false, message: "The sign-in link could not be prepared. Try again in a minute.", fieldErrors: {} };
    }
    throw error;
  }
  // Our own page, whether or not an account exists: the answer reveals nothing.
  return { ok: true, message: "Check your e-mail for the sign-in link.", fieldErrors: {}, redirectTo: "/sign-in/check-email" };
}
