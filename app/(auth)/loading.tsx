export default function Loading() {
  return (
    <p className="text-ink-muted" role="status">
      Loading…
    </p>
  );
}
