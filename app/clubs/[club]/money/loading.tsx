export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading" className="animate-pulse">
      <div className="mb-4 h-8 w-56 rounded bg-sand-200" />
      <div className="mb-4 h-10 rounded bg-sand-200" />
      <div className="h-64 rounded bg-sand-200" />
    </div>
  );
}
