'use client';

import { useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { useToast } from '@/components/ui/toast';
import type { CashFlowAnalysis, CashFlowSchedule } from '@/lib/cash-flows';
import { ApiError, sendForm } from '@/lib/api-client';
import { formatMoney, formatNumber, formatPercent } from '@/lib/format';

interface Preview {
  cashFlows: CashFlowSchedule;
  analysis: CashFlowAnalysis;
}

const lines = [
  ['revenue', 'Revenue'],
  ['operatingCost', 'Operating cost'],
  ['tax', 'Tax'],
  ['workingCapital', 'Working capital increase'],
  ['capex', 'Capex'],
] as const;

/** The message and the per-cell problems of a refused import. */
function problemOf(error: unknown): { message: string; problems: string[] } {
  if (error instanceof ApiError) return { message: error.message, problems: error.fields?.file ?? [] };
  return { message: error instanceof Error ? error.message : 'The import did not work.', problems: [] };
}

/**
 * Cash flows in and out as workbooks: the template to fill in, and an import that shows what
 * was read (every problem with its cell) before anything is saved.
 */
export function CashFlowImport({
  caseId,
  version,
  currency,
  disabledReason,
  onImported,
}: {
  caseId: string;
  version: number;
  currency: string;
  disabledReason: string | null;
  onImported: () => void;
}) {
  const toast = useToast();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<Preview | null>(null);
  const [problem, setProblem] = useState<{ message: string; problems: string[] } | null>(null);
  const [busy, setBusy] = useState(false);
  const importUrl = `/api/v1/cases/${caseId}/cash-flows/import`;

  const read = async (chosen: File) => {
    setFile(chosen);
    setBusy(true);
    setProblem(null);
    setPreview(null);
    try {
      const form = new FormData();
      form.append('file', chosen);
      setPreview((await sendForm<{ preview: Preview }>(importUrl, form)).preview);
    } catch (error) {
      setProblem(problemOf(error));
    } finally {
      setBusy(false);
      if (input.current) input.current.value = '';
    }
  };

  const confirm = async () => {
    if (!file) return;
    setBusy(true);
    try {
      const form = new FormData();
      form.append('file', file);
      form.append('confirm', 'true');
      form.append('version', String(version));
      await sendForm(importUrl, form);
      setPreview(null);
      toast(`Imported the cash flows from “${file.name}” and saved the case.`, 'success');
      onImported();
    } catch (error) {
      setProblem(problemOf(error));
      setPreview(null);
    } finally {
      setBusy(false);
    }
  };

  return (
    <div className="flex flex-wrap items-center gap-3">
      <a href="/api/v1/templates/cash-flows.xlsx" className="text-tide-600 underline">
        Download the workbook template
      </a>
      <label className={`inline-flex items-center gap-2 ${disabledReason ? 'opacity-60' : ''}`}>
        <span className="text-body">Import from a workbook:</span>
        <input
          ref={input}
          type="file"
          accept=".xlsx,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"
          disabled={!!disabledReason || busy}
          onChange={(e) => {
            const chosen = e.target.files?.[0];
            if (chosen) void read(chosen);
          }}
          className="text-body file:mr-3 file:rounded-md file:border file:border-line-strong file:bg-paper-raised file:px-3 file:py-1.5"
        />
      </label>
      {disabledReason ? <span className="text-caption text-ink-muted">{disabledReason}</span> : null}
      {problem ? (
        <div role="alert" className="w-full rounded-md border border-brick-500 bg-brick-100 px-4 py-3 text-brick-700">
          <p className="font-medium">{problem.message}</p>
          {problem.problems.length > 0 ? (
            <ul className="mt-1 list-disc pl-5 text-caption">
              {problem.problems.slice(0, 20).map((p) => (
                <li key={p}>{p}</li>
              ))}
              {problem.problems.length > 20 ? <li>… and {problem.problems.length - 20} more.</li> : null}
            </ul>
          ) : null}
        </div>
      ) : null}
      <Dialog open={preview !== null} size="wide" title={`Import “${file?.name ?? ''}”?`} onClose={() => setPreview(null)}>
        {preview ? (
          <div className="flex flex-col gap-4">
            <p className="text-ink-soft">
              Read {preview.cashFlows.rows.length} years at a WACC of {formatPercent(preview.cashFlows.wacc)}: static NPV{' '}
              {formatMoney(preview.analysis.npvAtWacc, currency)}, V₀ {formatMoney(preview.analysis.underlyingValue, currency)}. Nothing is saved until you
              confirm; the current cash flows are then replaced.
            </p>
            <div className="max-h-80 overflow-auto rounded-card border border-line">
              <table className="figures w-full border-collapse text-right text-body">
                <caption className="sr-only">Cash flows read from the workbook</caption>
                <thead>
                  <tr>
                    <th scope="col" className="bg-paper-sunk px-3 py-1 text-left text-caption uppercase text-ink-soft">
                      Year
                    </th>
                    {preview.cashFlows.rows.map((r) => (
                      <th key={r.year} scope="col" className="bg-paper-sunk px-3 py-1 text-caption text-ink-soft">
                        {r.year}
                      </th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {lines.map(([key, label]) => (
                    <tr key={key}>
                      <th scope="row" className="whitespace-nowrap border-t border-line px-3 py-1 text-left font-normal text-ink-soft">
                        {label}
                      </th>
                      {preview.cashFlows.rows.map((r) => (
                        <td key={r.year} className="border-t border-line px-3 py-1">
                          {formatNumber(r[key], 2)}
                        </td>
                      ))}
                    </tr>
                  ))}
                  <tr className="font-semibold">
                    <th scope="row" className="border-t border-line px-3 py-1 text-left">
                      Free cash flow
                    </th>
                    {preview.analysis.rows.map((r) => (
                      <td key={r.year} className="border-t border-line px-3 py-1">
                        {formatNumber(r.freeCashFlow, 2)}
                      </td>
                    ))}
                  </tr>
                </tbody>
              </table>
            </div>
            <div className="flex justify-end gap-2">
              <Button variant="secondary" onClick={() => setPreview(null)}>
                Cancel
              </Button>
              <Button onClick={() => void confirm()} busy={busy}>
                Replace the cash flows and save
              </Button>
            </div>
          </div>
        ) : null}
      </Dialog>
    </div>
  );
}
