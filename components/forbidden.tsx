import Link from 'next/link';

/** Shown instead of a page the signed-in role may not open (the server refused to load it). */
export function Forbidden() {
  return (
    <section role="alert" className="mx-auto max-w-lg py-16 text-center">
      <p className="text-caption uppercase tracking-wide text-ink-muted">403 · Not allowed</p>
      <h1 className="mt-2">Your role cannot open this page</h1>
      <p className="mt-3 text-ink-soft">Ask an admin of your organisation if you need access.</p>
      <Link href="/portfolio" className="mt-6 inline-block text-tide-600 underline">
        Go to the portfolio
      </Link>
    </section>
  );
}
