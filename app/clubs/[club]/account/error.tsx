"use client";

export default function AccountError({ reset }: { error: Error; reset: () => void }) {
  return (
    <div className="card">
      <h1 className="text-xl font-bold">Your account could not be shown</h1>
      <p className="mt-2 text-ink-700">No payment was taken by this error. Try again in a moment.</p>
      <button type="button" onClick={reset} className="mt-3 rounded bg-fin-600 px-4 py-2 font-bold text-white">Try again</button>
    </div>
  );
}
