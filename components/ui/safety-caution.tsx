export function SafetyCaution({ compact = false }: { compact?: boolean }) {
  return (
    <aside role="note" aria-label="Airworthiness caution" className={`rounded border-l-4 border-sock-500 bg-sock-100 text-ink-900 ${compact ? "px-3 py-2 text-sm" : "px-4 py-3"}`}>
      <strong>The pilot in command decides airworthiness.</strong>{" "}
      Hangarline only reports what has been recorded. Before every flight, preflight the aircraft and defer to its
      documents, the licensed mechanics who maintain it and your local regulations.
    </aside>
  );
}
