export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading" className="animate-pulse">
      <div className="mb-4 h-8 w-64 rounded bg-sand-200" />
      <div className="grid gap-3 lg:grid-cols-2"><div className="h-40 rounded bg-sand-200" /><div className="h-40 rounded bg-sand-200" /></div>
    </div>
  );
}
