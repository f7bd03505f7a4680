"use server";
import { signOut } from "@/auth";
import type { ActionState } from "@/lib/actions/action-state";

/** Ends the session; the form's hook then goes to the sign-in page (actions never redirect themselves). */
export async function signOutAction(_prev: ActionState, _formData: FormData): Promise<ActionState> {
  await signOut({ redirect: false });
  return { ok: true, message: "Signed out.", fieldErrors: {}, redirectTo: "/sign-in?signedOut=1" };
}
