import Link from 'next/link';

export default function NotFound() {
  return (
    <section className="mx-auto max-w-lg py-16 text-center">
      <p className="text-caption uppercase tracking-wide text-ink-muted">404</p>
      <h1 className="mt-2">Not found in your organisation</h1>
      <p className="mt-3 text-ink-soft">It may have been removed, or it belongs to another organisation.</p>
      <Link href="/portfolio" className="mt-6 inline-block text-tide-600 underline">
        Go to the portfolio
      </Link>
    </section>
  );
}
