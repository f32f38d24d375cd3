'use client';

import { useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { useToast } from '@/components/ui/toast';
import { ApiError, sendForm } from '@/lib/api-client';

/**
 * Records a dated series of values at once from a CSV or XLSX (dates in the first column, values
 * in the second). Nothing is recorded unless every row passes; a refusal names its line or cell.
 */
export function WatchImport({ caseId, onRecorded }: { caseId: string; onRecorded: () => Promise<unknown> }) {
  const toast = useToast();
  const input = useRef<HTMLInputElement>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const upload = async (file: File) => {
    setBusy(true);
    setProblem(null);
    const form = new FormData();
    form.append('file', file);
    try {
      const made = await sendForm<{ recorded: number; from: string; to: string }>(`/api/v1/cases/${caseId}/observations/import`, form);
      toast(`Recorded ${made.recorded} value${made.recorded === 1 ? '' : 's'} from ${made.from} to ${made.to}.`, 'success');
      await onRecorded();
    } catch (error) {
      setProblem(error instanceof ApiError ? (error.fields?.file?.[0] ?? error.message) : 'The file could not be sent; try again.');
    } finally {
      setBusy(false);
      if (input.current) input.current.value = '';
    }
  };

  return (
    <div className="mt-4 flex flex-wrap items-center gap-3 border-t border-line pt-4">
      <input
        ref={input}
        type="file"
        accept=".csv,.xlsx,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"
        className="sr-only"
        aria-label="A CSV or XLSX of dated values"
        onChange={(e) => {
          const file = e.target.files?.[0];
          if (file) void upload(file);
        }}
      />
      <Button type="button" variant="secondary" busy={busy} onClick={() => input.current?.click()}>
        Upload dated values…
      </Button>
      <span className="text-caption text-ink-muted">CSV or XLSX: dates (YYYY-MM-DD) in the first column, values in the second.</span>
      {problem ? (
        <p role="alert" className="w-full text-caption text-brick-700">
          {problem}
        </p>
      ) : null}
    </div>
  );
}
