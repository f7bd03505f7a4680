"use client";

export default function ErrorPage({ reset }: { error: Error; reset: () => void }) {
  return (
    <main className="mx-auto max-w-lg p-6">
      <div className="card mt-10">
        <h1 className="text-2xl font-bold">Something went wrong</h1>
        <p className="mt-2 text-ink-700">Nothing you were doing was half-saved: changes are all-or-nothing. Try again.</p>
        <button type="button" onClick={reset} className="mt-4 rounded bg-fin-600 px-4 py-2 font-bold text-white">Try again</button>
      </div>
    </main>
  );
}
