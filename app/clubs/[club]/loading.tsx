export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading" className="animate-pulse">
      <div className="mb-4 h-8 w-48 rounded bg-sand-200" />
      <div className="grid gap-3 sm:grid-cols-2"><div className="h-28 rounded bg-sand-200" /><div className="h-28 rounded bg-sand-200" /></div>
    </div>
  );
}
