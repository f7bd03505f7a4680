import type { Metadata } from "next";
import Link from "next/link";
import { buttonClass } from "@/components/ui/button";

export const metadata: Metadata = { title: { absolute: "Hangarline · Flying club portal" } };

export default function Landing() {
  return (
    <main className="mx-auto max-w-4xl p-4 sm:p-10">
      <p className="text-sm font-bold uppercase tracking-widest text-fin-600">Hangarline</p>
      <h1 className="mt-2 text-3xl font-bold sm:text-5xl">The flying club, run in one place.</h1>
      <p className="mt-4 max-w-2xl text-lg text-ink-700">
        Which aircraft can fly today and why, what comes due next, who is current, who owes what — kept by the
        club&apos;s own officers, for the members who fly.
      </p>
      <p className="mt-6"><Link href="/sign-in" className={buttonClass("primary")}>Sign in</Link></p>
      <ul className="mt-10 grid gap-4 sm:grid-cols-3">
        <li className="card"><h2 className="font-bold">Flight line</h2><p className="mt-1 text-ink-700">Status computed from inspections, squawks and grounding notices, with the reasons in words.</p></li>
        <li className="card"><h2 className="font-bold">Members and safety</h2><p className="mt-1 text-ink-700">Roles, checkouts, bulletins to acknowledge and confidential reports.</p></li>
        <li className="card"><h2 className="font-bold">Money</h2><p className="mt-1 text-ink-700">A double-entry ledger for dues, flight time, card payments and the bank.</p></li>
      </ul>
      <p className="mt-10 text-sm text-ink-500">The pilot in command decides airworthiness. Hangarline informs that decision and never replaces a preflight, a mechanic&apos;s sign-off or the aircraft&apos;s documents.</p>
    </main>
  );
}
