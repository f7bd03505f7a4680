export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading the bookings" className="animate-pulse">
      <div className="mb-4 h-8 w-40 rounded bg-sand-200" />
      <div className="mb-4 h-12 rounded bg-sand-200" />
      <div className="grid gap-4 xl:grid-cols-2">{[0, 1, 2, 3].map((i) => <div key={i} className="h-56 rounded bg-sand-200" />)}</div>
    </div>
  );
}
