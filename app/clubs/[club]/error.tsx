"use client";

export default function ClubError({ reset }: { error: Error; reset: () => void }) {
  return (
    <div className="card">
      <h1 className="text-xl font-bold">This page could not be shown</h1>
      <p className="mt-2 text-ink-700">Nothing was half-saved. Try again, or go back to the club home page.</p>
      <button type="button" onClick={reset} className="mt-3 rounded bg-fin-600 px-4 py-2 font-bold text-white">Try again</button>
    </div>
  );
}
