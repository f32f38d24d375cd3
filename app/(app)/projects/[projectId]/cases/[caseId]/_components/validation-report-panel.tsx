'use client';

import { useState } from 'react';
import { mutate } from 'swr';
import { Button } from '@/components/ui/button';
import { ApiError, sendJson } from '@/lib/api-client';
import { DownloadLink } from '@/components/ui/download-link';

const link = 'inline-flex items-center rounded-md border border-line-strong px-4 py-2 font-medium hover:bg-paper-sunk';

/**
 * The validation report of the case as saved (lib/validation-report/): downloads, and for those
 * who review, a way to keep it with the case's documents before deciding.
 */
export function ValidationReportPanel({ caseId, canAttach, unsaved }: { caseId: string; canAttach: boolean; unsaved: boolean }) {
  const [busy, setBusy] = useState(false);
  const [kept, setKept] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const attach = async () => {
    setBusy(true);
    setProblem(null);
    setKept(null);
    try {
      const { attachment } = await sendJson<{ attachment: { filename: string } }>('POST', `/api/v1/cases/${caseId}/validation-report/attachments`);
      setKept(attachment.filename);
      // The Documents tab lists it at once.
      await mutate(`/api/v1/cases/${caseId}/attachments`);
    } catch (error) {
      setProblem(error instanceof ApiError ? error.message : 'The report was not attached; try again.');
    } finally {
      setBusy(false);
    }
  };
  return (
    <section aria-labelledby="validation-report-heading" className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
      <h3 id="validation-report-heading" className="text-body font-semibold">
        Validation report
      </h3>
      <p className="mb-3 text-caption text-ink-muted">
        The saved version’s conventions in plain words, its inputs and their sources, convergence, what is plan and what is option, sensitivities, the latest
        cross-check of this version and the engine’s published-value checks, with the cautions.
        {unsaved ? ' It reports the saved version: save first to include your changes.' : ''}
      </p>
      <div className="flex flex-wrap gap-3">
        <DownloadLink className={link} href={`/api/v1/cases/${caseId}/validation-report?size=A4`}>
          Validation report (PDF, A4)
        </DownloadLink>
        <DownloadLink className={link} href={`/api/v1/cases/${caseId}/validation-report?size=LETTER`}>
          Validation report (PDF, US Letter)
        </DownloadLink>
        <DownloadLink className={link} href={`/api/v1/cases/${caseId}/validation-report.xlsx`}>
          Validation workbook (XLSX)
        </DownloadLink>
        {canAttach ? (
          <Button variant="secondary" busy={busy} disabled={busy} onClick={() => void attach()}>
            Keep it with the case’s documents
          </Button>
        ) : null}
      </div>
      <div role="status" aria-live="polite">
        {kept ? <p className="mt-3 rounded-md bg-tide-50 px-3 py-2 text-tide-700">Kept with the case’s documents as “{kept}”.</p> : null}
      </div>
      {problem ? (
        <p role="alert" className="mt-3 text-brick-700">
          {problem}
        </p>
      ) : null}
    </section>
  );
}
