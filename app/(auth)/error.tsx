'use client';

export default function AuthError({ reset }: { error: Error; reset: () => void }) {
  return (
    <div role="alert">
      <h1>Something went wrong</h1>
      <p className="mt-2 text-ink-soft">Please try again. If it keeps happening, contact your Leeway admin.</p>
      <button className="mt-4 text-tide-600 underline" onClick={reset}>
        Try again
      </button>
    </div>
  );
}
