import Link from "next/link";

export default function AccountNotFound() {
  return (
    <div className="card">
      <h1 className="text-xl font-bold">Not found</h1>
      <p className="mt-2 text-ink-700">There is no such statement or account in this club.</p>
      <p className="mt-3"><Link href="/clubs">Your clubs</Link></p>
    </div>
  );
}
