import Link from 'next/link';

export default function NotFound() {
  return (
    <main className="mx-auto max-w-lg px-6 py-24 text-center">
      <p className="text-caption uppercase tracking-wide text-ink-muted">404</p>
      <h1 className="mt-2">This page does not exist here</h1>
      <p className="mt-3 text-ink-soft">It may have moved, or it belongs to another organisation.</p>
      <Link href="/" className="mt-6 inline-block text-tide-600 underline">
        Back to Leeway
      </Link>
    </main>
  );
}
