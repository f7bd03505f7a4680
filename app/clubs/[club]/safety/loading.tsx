export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading" className="animate-pulse">
      <div className="mb-4 h-8 w-56 rounded bg-sand-200" />
      <div className="mb-3 h-12 rounded bg-sand-200" />
      <div className="grid gap-3"><div className="h-20 rounded bg-sand-200" /><div className="h-20 rounded bg-sand-200" /></div>
    </div>
  );
}
