'use client';

import { Button } from './ui/button';

/** A queued job's progress bar with its state in words, and Cancel while it runs (when the viewer may). */
export function JobProgress({ label, progress, state, onCancel }: { label: string; progress: number; state: string; onCancel?: () => void }) {
  return (
    <div className="flex items-center gap-3">
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.round(progress * 100)}
        className="h-3 w-72 overflow-hidden rounded-full bg-paper-sunk"
      >
        <div className="h-full bg-tide-500 transition-[width]" style={{ width: `${progress * 100}%` }} />
      </div>
      <span className="figures text-caption text-ink-soft">{state}</span>
      {onCancel ? (
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      ) : null}
    </div>
  );
}
