import { signOutAction } from "@/lib/actions/auth/sign-out";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export function SignOutButton() {
  return (
    <form action={signOutAction}>
      <IdempotencyKeyField />
      <button type="submit" className="rounded px-3 py-2 text-sm text-sand-50 underline-offset-2 hover:underline">Sign out</button>
    </form>
  );
}
