import { SignOutForm } from "@/components/ramp/sign-out-form";

export function SignOutButton() {
  return (
    <SignOutForm>
      <button type="submit" className="rounded px-3 py-2 text-sm text-sand-50 underline-offset-2 hover:underline">Sign out</button>
    </SignOutForm>
  );
}
