"use server";
import { signOut } from "@/auth";
import type { ActionState } from "@/lib/actions/action-state";

/** Ends the session (it takes no input); the form's hook then loads the sign-in page (actions never redirect themselves). */
export async function signOutAction(): Promise<ActionState> {
  await signOut({ redirect: false });
  return { ok: true, message: "Signed out.", fieldErrors: {}, redirectTo: "/sign-in?signedOut=1" };
}
