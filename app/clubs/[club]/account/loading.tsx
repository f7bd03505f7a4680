export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading" className="animate-pulse">
      <div className="mb-4 h-8 w-48 rounded bg-sand-200" />
      <div className="mb-4 h-32 rounded bg-sand-200" />
      <div className="h-48 rounded bg-sand-200" />
    </div>
  );
}
