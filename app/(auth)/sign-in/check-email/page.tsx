import type { Metadata } from "next";
import Link from "next/link";

export const metadata: Metadata = { title: "Check your e-mail" };

export default function CheckEmailPage() {
  return (
    <main className="mx-auto max-w-lg p-4 sm:p-8">
      <div className="card">
        <h1 className="text-2xl font-bold">Check your e-mail</h1>
        <p className="mt-2 text-ink-700">If an account uses that address, a sign-in link is on its way. It works once and expires in 15 minutes.</p>
        <p className="mt-4"><Link href="/sign-in">Back to sign-in</Link></p>
      </div>
    </main>
  );
}
