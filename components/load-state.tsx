'use client';

import { Button } from './ui/button';

/** What a panel shows while its data loads: grey bars of the content's rough shape, announced as busy. */
export function LoadingBlock({ label, lines = 4 }: { label: string; lines?: number }) {
  return (
    <div role="status" aria-live="polite" aria-busy="true" className="rounded-card border border-line bg-paper-raised p-6 shadow-card">
      <span className="sr-only">{label}</span>
      <div className="flex animate-pulse flex-col gap-3" aria-hidden>
        {Array.from({ length: lines }, (_, k) => (
          <div key={k} className="h-4 rounded bg-paper-sunk" style={{ width: `${90 - ((k * 17) % 40)}%` }} />
        ))}
      </div>
    </div>
  );
}

/** What a panel shows when its data could not be loaded, with a way to try again. */
export function LoadError({ message, onRetry }: { message: string; onRetry?: () => void }) {
  return (
    <div role="alert" className="rounded-card border border-brick-500 bg-brick-100 px-6 py-4 text-brick-700">
      <p className="font-medium">This could not be loaded.</p>
      <p className="mt-1 text-body">{message}</p>
      {onRetry ? (
        <Button variant="secondary" className="mt-3" onClick={onRetry}>
          Try again
        </Button>
      ) : null}
    </div>
  );
}
