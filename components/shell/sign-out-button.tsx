import { signOutAction } from "@/lib/actions/auth/sign-out";

export function SignOutButton() {
  return (
    <form action={signOutAction}>
      <button type="submit" className="rounded px-3 py-2 text-sm text-sand-50 underline-offset-2 hover:underline">Sign out</button>
    </form>
  );
}
