export default function Loading() {
  return (
    <div role="status" aria-live="polite" className="animate-pulse">
      <div className="h-8 w-64 rounded bg-paper-sunk" />
      <div className="mt-6 h-40 rounded-card bg-paper-sunk" />
      <span className="sr-only">Loading…</span>
    </div>
  );
}
