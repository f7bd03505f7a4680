import Link from "next/link";

export default function MoneyNotFound() {
  return (
    <div className="card">
      <h1 className="text-xl font-bold">Not found</h1>
      <p className="mt-2 text-ink-700">That record does not exist in this club&apos;s books, or your role does not show it.</p>
      <p className="mt-3"><Link href="/clubs">Your clubs</Link></p>
    </div>
  );
}
