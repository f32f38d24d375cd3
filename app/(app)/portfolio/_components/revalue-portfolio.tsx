'use client';

import { useState } from 'react';
import useSWR from 'swr';
import { Button } from '@/components/ui/button';
import { getJson, sendJson } from '@/lib/api-client';

interface Revaluation {
  id: string;
  status: 'running' | 'done' | 'failed';
  total: number | null;
  done: number;
  failed: number;
  error: string | null;
}

/** What the job is doing, in words: queued, its progress, how it ended, or that its progress could not be read. */
function progressWords(state: Revaluation | undefined, error: Error | undefined, running: boolean): string {
  if (!state) {
    if (error) return `Its progress could not be read (${error.message}); trying again.`;
    return running ? 'Queued…' : '';
  }
  if (state.status === 'running') return state.total === null ? 'Starting…' : `Re-valuing: ${state.done} of ${state.total} cases…`;
  if (state.status === 'failed') return state.error ?? 'The re-valuation failed.';
  const failed = state.failed ? `; ${state.failed} could not be valued (see each case)` : '';
  return `Re-valued ${state.done - state.failed} of ${state.total ?? 0} cases with today's engine${failed}.`;
}

/**
 * Stored figures from an older engine, re-valued in one go: a job on the queue (POST
 * /api/v1/portfolio/revaluations), its progress read every two seconds until it ends.
 */
export function RevaluePortfolio({ onStarted, onFinished }: { onStarted: () => void; onFinished: () => void }) {
  const [id, setId] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [starting, setStarting] = useState(false);
  const progress = useSWR<Revaluation>(id ? `/api/v1/portfolio/revaluations/${id}` : null, getJson, {
    refreshInterval: (latest) => (latest && latest.status !== 'running' ? 0 : 2000),
    onSuccess: (latest) => {
      if (latest.status !== 'running') onFinished();
    },
  });
  const start = async () => {
    setProblem(null);
    setStarting(true);
    try {
      setId((await sendJson<{ id: string }>('POST', '/api/v1/portfolio/revaluations')).id);
      onStarted();
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The re-valuation did not start.');
    } finally {
      setStarting(false);
    }
  };
  // From the click on: a second click while the first is on its way would queue a second job.
  const running = starting || (id !== null && (!progress.data || progress.data.status === 'running'));
  return (
    <div className="flex flex-wrap items-center gap-3 rounded-card border border-line bg-paper-sunk px-4 py-3" role="region" aria-label="Re-value figures">
      <p className="text-body">{id ? 'Stored figures from an older engine version:' : 'Some stored figures come from an older engine version.'}</p>
      <Button variant="secondary" busy={running} disabled={running} onClick={() => void start()}>
        Re-value them all
      </Button>
      <p className="text-caption text-ink-soft" role="status">
        {problem ?? progressWords(progress.data, progress.error as Error | undefined, running)}
      </p>
    </div>
  );
}
