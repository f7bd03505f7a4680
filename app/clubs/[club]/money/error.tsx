"use client";

export default function MoneyError({ reset }: { error: Error; reset: () => void }) {
  return (
    <div className="card">
      <h1 className="text-xl font-bold">The money pages could not be shown</h1>
      <p className="mt-2 text-ink-700">Nothing was half-posted: every posting is one transaction. Try again.</p>
      <button type="button" onClick={reset} className="mt-3 rounded bg-fin-600 px-4 py-2 font-bold text-white">Try again</button>
    </div>
  );
}
