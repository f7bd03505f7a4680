import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-lg p-6">
      <div className="card mt-10">
        <h1 className="text-2xl font-bold">Not found</h1>
        <p className="mt-2 text-ink-700">There is nothing at this address, or it belongs to a club you are not part of.</p>
        <p className="mt-4"><Link href="/clubs">Back to your clubs</Link></p>
      </div>
    </main>
  );
}
