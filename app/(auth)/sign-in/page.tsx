import type { Metadata } from "next";
import { MagicLinkForm, PasswordSignInForm } from "@/components/auth/sign-in-forms";
import { safeCallbackUrl } from "@/lib/validation/auth";

export const metadata: Metadata = { title: "Sign in" };

const ERRORS: Record<string, string> = {
  Verification: "That sign-in link has expired or was already used. Ask for a new one.",
  AccessDenied: "That sign-in link cannot be used. Ask for a new one.",
};

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const sp = await searchParams;
  const callbackUrl = safeCallbackUrl(sp.callbackUrl ?? "/clubs");
  const error = sp.error ? ERRORS[sp.error] ?? "Sign-in did not complete. Try again." : null;
  return (
    <main className="mx-auto grid max-w-4xl gap-6 p-4 sm:p-8 md:grid-cols-2">
      <div className="md:col-span-2">
        <p className="text-sm font-bold uppercase tracking-widest text-fin-600">Hangarline</p>
        <h1 className="text-3xl font-bold">Sign in</h1>
        {sp.signedOut ? <p role="status" className="mt-2 text-go-800">You are signed out.</p> : null}
        {sp.joined ? <p role="status" className="mt-2 text-go-800">Your account is ready. Sign in to open your club.</p> : null}
        {error ? <p role="alert" className="mt-2 rounded border border-stop-600 bg-stop-100 px-3 py-2 text-stop-800">{error}</p> : null}
      </div>
      <section className="card" aria-labelledby="pw-h">
        <h2 id="pw-h" className="mb-3 text-lg font-bold">With your password</h2>
        <PasswordSignInForm callbackUrl={callbackUrl} />
      </section>
      <section className="card" aria-labelledby="ml-h">
        <h2 id="ml-h" className="mb-3 text-lg font-bold">With a link by e-mail</h2>
        <p className="mb-3 text-sm text-ink-700">We send a one-time link to the address on your account.</p>
        <MagicLinkForm callbackUrl={callbackUrl} />
      </section>
    </main>
  );
}
