export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading the pilot tools" className="animate-pulse">
      <div className="mb-4 h-8 w-48 rounded bg-sand-200" />
      <div className="grid gap-4 sm:grid-cols-3">{[0, 1, 2].map((i) => <div key={i} className="h-32 rounded bg-sand-200" />)}</div>
    </div>
  );
}
