/**
 * The skeleton shown while a workspace page loads. Each segment that may show it re-exports it as
 * its loading.tsx; the project and case pages do not, because a loading boundary above a page
 * starts the answer (status 200) before the page can say "not found" (404).
 */
export default function Loading() {
  return (
    <div role="status" aria-live="polite" className="animate-pulse">
      <div className="h-8 w-64 rounded bg-paper-sunk" />
      <div className="mt-6 h-40 rounded-card bg-paper-sunk" />
      <span className="sr-only">Loading…</span>
    </div>
  );
}
