'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import useSWR from 'swr';
import { FigureCells, FigureHeads } from '@/components/case-figures';
import { EmptyState } from '@/components/empty-state';
import { FormProblem } from '@/components/form-problem';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Input } from '@/components/ui/input';
import { OlderEngineNote } from '@/components/older-engine-note';
import { StatusBadge } from '@/components/status-badge';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import type { CaseStatus } from '@/lib/review/transitions';
import { ENGINE_VERSION } from '@/lattice';
import { useToast } from '@/components/ui/toast';
import { getJson, sendJson } from '@/lib/api-client';
import type { CaseJson } from '@/lib/case-json';
import { formatDate } from '@/lib/format';
import { starterCase } from '@/lib/starter-case';

type Pending = { kind: 'new' } | { kind: 'duplicate'; source: CaseJson } | { kind: 'delete'; target: CaseJson } | null;

/**
 * A project's cases with their latest figures; analysts add, duplicate and delete cases here.
 * `initial` is the list as the page rendered it, shown before the script has run.
 */
export function CaseTable(props: {
  projectId: string;
  currency: string;
  canEdit: boolean;
  defaults: { wacc: number; riskFreeRate: number };
  initial: { cases: CaseJson[] };
}) {
  const { projectId, currency, canEdit } = props;
  const url = `/api/v1/projects/${projectId}/cases`;
  // Fetched again on mount all the same: SWR prefers its cache to `initial`, and a list cached on
  // an earlier visit may be older than the page.
  const { data, error, isLoading, mutate } = useSWR<{ cases: CaseJson[] }>(url, getJson, { fallbackData: props.initial });
  const [pending, setPending] = useState<Pending>(null);
  const [name, setName] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const router = useRouter();
  const toast = useToast();

  // Stored figures from an older engine version are flagged; a re-value stores a run of today's.
  const revalue = async (c: CaseJson) => {
    setBusy(true);
    try {
      await sendJson('POST', `/api/v1/cases/${c.id}/valuations`);
      toast(`“${c.name}” was valued again with ${ENGINE_VERSION}.`, 'success');
      await mutate();
    } catch (e) {
      toast(e instanceof Error ? e.message : 'The case could not be valued.', 'error');
    } finally {
      setBusy(false);
    }
  };

  const open = (next: Pending, initialName = '') => {
    setPending(next);
    setName(initialName);
    setProblem(null);
  };

  const confirm = async () => {
    if (!pending) return;
    setBusy(true);
    setProblem(null);
    try {
      if (pending.kind === 'new') {
        const { case: made } = await sendJson<{ case: CaseJson }>('POST', url, starterCase(name, props.defaults));
        router.push(`/projects/${projectId}/cases/${made.id}`);
        return;
      }
      if (pending.kind === 'duplicate') {
        await sendJson('POST', `/api/v1/cases/${pending.source.id}/duplicate`, { name });
        toast(`“${name}” is an independent copy of “${pending.source.name}”.`, 'success');
      } else {
        await sendJson('DELETE', `/api/v1/cases/${pending.target.id}`);
        toast(`“${pending.target.name}” was deleted.`, 'success');
      }
      setPending(null);
      await mutate();
    } catch (e) {
      setProblem(e instanceof Error ? e.message : 'That did not work.');
    } finally {
      setBusy(false);
    }
  };

  // With the page's own list as `fallbackData` there is always data; SWR's isLoading is true
  // while it fetches again on mount, which would hide that list from the server's HTML.
  if (!data && isLoading) return <LoadingBlock label="Loading cases" />;
  if (error || !data) return <LoadError message={error?.message ?? 'No answer from the server.'} onRetry={() => mutate()} />;
  const cases = data.cases;
  return (
    <div>
      {canEdit ? (
        <div className="mb-3 flex justify-end">
          <Button onClick={() => open({ kind: 'new' }, cases.length === 0 ? 'Base case' : '')}>New case</Button>
        </div>
      ) : null}
      {cases.length === 0 ? (
        <EmptyState title="No cases yet">
          {canEdit
            ? 'A case is one scenario of the project: its cash flows, volatility and options. Start with “New case”.'
            : 'The analysts have not added a case yet.'}
        </EmptyState>
      ) : (
        <Table caption="Cases of this project">
          <thead>
            <tr>
              <Th>Case</Th>
              <Th>Status</Th>
              <FigureHeads />
              <Th>Figures of</Th>
              <Th>Version</Th>
              {canEdit ? <Th className="text-right">Actions</Th> : null}
            </tr>
          </thead>
          <tbody>
            {cases.map((c) => (
              <Tr key={c.id}>
                <Td>
                  <Link href={`/projects/${projectId}/cases/${c.id}`} className="font-medium text-tide-600 hover:underline">
                    {c.name}
                  </Link>
                </Td>
                <Td>
                  <StatusBadge status={c.status as CaseStatus} />
                </Td>
                <FigureCells figures={c.latest} currency={currency} />
                <Td>
                  {c.latest ? (
                    <>
                      <span className="figures">v{c.latest.caseVersion}</span> · {formatDate(c.latest.valuedAt)}
                      {c.latest.caseVersion < c.version ? <span className="block text-caption text-ember-700">edited since: not yet valued</span> : null}
                      <OlderEngineNote engineVersion={c.latest.engineVersion}>
                        {canEdit && c.status !== 'in_review' ? (
                          <>
                            {' '}
                            <Button variant="quiet" busy={busy} onClick={() => revalue(c)} aria-label={`Re-value ${c.name} with today's engine`}>
                              Re-value
                            </Button>
                          </>
                        ) : null}
                      </OlderEngineNote>
                    </>
                  ) : (
                    <span className="text-ink-muted">Not yet</span>
                  )}
                </Td>
                <Td className="figures">v{c.version}</Td>
                {canEdit ? (
                  <Td className="whitespace-nowrap text-right">
                    <Button variant="quiet" onClick={() => open({ kind: 'duplicate', source: c }, `${c.name} (copy)`)} aria-label={`Duplicate ${c.name}`}>
                      Duplicate
                    </Button>
                    <Button variant="quiet" onClick={() => open({ kind: 'delete', target: c })} aria-label={`Delete ${c.name}`}>
                      Delete
                    </Button>
                  </Td>
                ) : null}
              </Tr>
            ))}
          </tbody>
        </Table>
      )}
      <Dialog
        open={pending !== null}
        title={
          pending?.kind === 'new'
            ? 'New case'
            : pending?.kind === 'duplicate'
              ? `Duplicate “${pending.source.name}”`
              : `Delete “${pending?.kind === 'delete' ? pending.target.name : ''}”?`
        }
        onClose={() => setPending(null)}
      >
        <form
          onSubmit={(e) => {
            e.preventDefault();
            void confirm();
          }}
          className="flex flex-col gap-4"
        >
          {pending?.kind === 'delete' ? (
            <p className="text-ink-soft">The case, its stored valuations and its history go for good. Other cases of the project are not touched.</p>
          ) : (
            <Input
              label="Case name"
              autoFocus
              // A suggested name is selected as the dialog opens, so what a person types replaces it.
              onFocus={(e) => e.currentTarget.select()}
              value={name}
              onChange={(e) => setName(e.target.value)}
              hint={pending?.kind === 'duplicate' ? 'The copy is edited independently of the original.' : 'A scenario, e.g. “Base case” or “Slow ramp-up”.'}
              required
              maxLength={120}
            />
          )}
          <FormProblem message={problem} />
          <div className="flex justify-end gap-2">
            <Button variant="secondary" onClick={() => setPending(null)}>
              Cancel
            </Button>
            <Button
              type="submit"
              variant={pending?.kind === 'delete' ? 'danger' : 'primary'}
              busy={busy}
              disabled={pending?.kind !== 'delete' && name.trim() === ''}
            >
              {pending?.kind === 'delete' ? 'Delete case' : pending?.kind === 'duplicate' ? 'Duplicate' : 'Create case'}
            </Button>
          </div>
        </form>
      </Dialog>
    </div>
  );
}
