'use client';

export default function AppError({ reset }: { error: Error; reset: () => void }) {
  return (
    <section role="alert" className="mx-auto max-w-lg py-16 text-center">
      <h1>This page could not be shown</h1>
      <p className="mt-3 text-ink-soft">Nothing you saved has been lost. Please try again; if it keeps happening, tell your Leeway admin.</p>
      <button className="mt-6 rounded-md bg-tide-500 px-4 py-2 text-white" onClick={reset}>
        Try again
      </button>
    </section>
  );
}
