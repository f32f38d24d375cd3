'use client';

import { useState, type FormEvent } from 'react';
import useSWR from 'swr';
import { BoundaryChart } from '@/components/charts/boundary-chart';
import { EmptyState } from '@/components/empty-state';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { Button } from '@/components/ui/button';
import { Input } from '@/components/ui/input';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { useToast } from '@/components/ui/toast';
import { ValuationCaution } from '@/components/valuation-caution';
import type { RightResult } from '@/lattice';
import { ApiError, getJson, sendJson } from '@/lib/api-client';
import { formatMoney } from '@/lib/format';
import { readNumberText } from '@/lib/number-text';
import type { RightStatus } from '@/lib/watch/status';
import { dateOf, yearsBetween } from '@/lib/watch/dates';
import { distanceWords, statusWords } from '@/lib/watch/status-words';
import { WatchAlerts, type CaseAlert } from './watch-alerts';
import { WatchDecisions, type RecordedDecision } from './watch-decisions';
import { WatchImport } from './watch-import';
import type { Snapshot } from './review-history';

interface Watch {
  followed: { caseVersion: number; valuationDate: string; horizon: number; value: number; replaces: { caseVersion: number; approvedOn: string } | null };
  /** Each approved right with its exercise boundary, for the chart. */
  boundaries: RightResult[];
  asOf: string;
  value: number;
  valueOn: string;
  revaluedExpandedNpv: number | null;
  rights: {
    id: string;
    name: string;
    status: RightStatus;
    critical: number | null;
    distanceRatio: number | null;
    distanceSd: number | null;
    windowOpensAt: string | null;
    windowClosesAt: string | null;
  }[];
  observations: { id: string; observedOn: string; value: number; note: string; source: string; recordedBy: string | null }[];
  decisions: RecordedDecision[];
  alerts: CaseAlert[];
}

const statusTone: Record<RightStatus, string> = {
  in_region: 'bg-tide-100 text-tide-700',
  near: 'bg-ember-100 text-ember-700',
  outside: 'bg-paper-sunk text-ink-soft',
  window_not_open: 'bg-paper-sunk text-ink-soft',
  window_closed: 'bg-paper-sunk text-ink-muted',
  exercised: 'bg-tide-100 text-tide-700',
  declined: 'bg-paper-sunk text-ink-muted',
};

const today = () => dateOf(new Date());

/** Following the approved version: the project's value as observed, and where each right stands. */
export function WatchPanel({ caseId, currency, canRecord }: { caseId: string; currency: string; canRecord: boolean }) {
  const toast = useToast();
  // The review history (the Review tab's own request, shared through SWR's cache) says whether a
  // version was ever approved; only then is there anything to follow, so a case never approved
  // shows its empty state without asking for the watch and getting a 409 in the console.
  const history = useSWR<{ snapshots: Pick<Snapshot, 'status'>[] }>(`/api/v1/cases/${caseId}/snapshots`, getJson);
  const approved = history.data?.snapshots.some((s) => s.status === 'approved') ?? false;
  const watch = useSWR<Watch>(approved ? `/api/v1/cases/${caseId}/watch` : null, getJson, { revalidateOnFocus: false });
  const [form, setForm] = useState({ date: today(), value: '', source: '', note: '' });
  const [problems, setProblems] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);

  if (history.isLoading || watch.isLoading) return <LoadingBlock label="Loading where the rights stand" lines={5} />;
  if (history.error) return <LoadError message={history.error.message} onRetry={() => history.mutate()} />;
  // The watch answers 409 when it finds no approved version: the same empty state.
  if (!approved || (watch.error instanceof ApiError && watch.error.status === 409))
    return (
      <EmptyState title="Nothing to follow yet">
        Watching starts when a version is approved: from then on, record the project&rsquo;s value as it becomes known and Leeway says where each right stands.
      </EmptyState>
    );
  if (watch.error || !watch.data) return <LoadError message={watch.error?.message ?? 'No answer from the server.'} onRetry={() => watch.mutate()} />;
  const w = watch.data;

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const value = readNumberText(form.value);
    if (!value.ok) return setProblems({ value: value.message });
    setBusy(true);
    setProblems({});
    try {
      await sendJson('POST', `/api/v1/cases/${caseId}/observations`, { date: form.date, value: value.value, source: form.source, note: form.note });
      toast(`Recorded ${formatMoney(value.value, currency)} on ${form.date}.`, 'success');
      setForm((f) => ({ ...f, value: '', note: '' }));
      await watch.mutate();
    } catch (error) {
      if (error instanceof ApiError) {
        setProblems(error.fieldProblems());
        toast(error.message, 'error');
      } else toast('The value could not be recorded; try again.', 'error');
    } finally {
      setBusy(false);
    }
  };

  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="watch-rights" className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
        <h3 id="watch-rights" className="text-body font-semibold">
          Where each right stands on {w.asOf}
        </h3>
        <p className="mb-3 text-caption text-ink-muted">
          Version {w.followed.caseVersion}, approved {w.followed.valuationDate}; project value {formatMoney(w.value, currency)}
          {w.observations.length === 0 ? ' (as approved: no value recorded since)' : ` (observed ${w.valueOn})`}.{' '}
          {w.revaluedExpandedNpv !== null
            ? w.asOf > w.followed.valuationDate
              ? `Re-valued from today with the decisions recorded (the investment made at approval is sunk), the project with its rights is worth ${formatMoney(w.revaluedExpandedNpv, currency)}.`
              : `Re-valued today with the decisions recorded, the expanded NPV is ${formatMoney(w.revaluedExpandedNpv, currency)}.`
            : ''}
          {w.followed.replaces
            ? ` It replaces version ${w.followed.replaces.caseVersion} (approved ${w.followed.replaces.approvedOn}) as the model followed; that version's decisions stay on its record and in this version's board pack.`
            : ''}
        </p>
        <Table caption="Where each right stands">
          <thead>
            <tr>
              <Th>Right</Th>
              <Th>Status</Th>
              <Th>Critical value</Th>
              <Th>Distance</Th>
              <Th>Window</Th>
            </tr>
          </thead>
          <tbody>
            {w.rights.map((r) => (
              <Tr key={r.id}>
                <Td>{r.name}</Td>
                <Td>
                  <span className={`rounded px-2 py-0.5 text-caption font-medium ${statusTone[r.status]}`}>{statusWords[r.status]}</span>
                </Td>
                <Td>{r.critical === null ? '–' : formatMoney(r.critical, currency)}</Td>
                <Td>{distanceWords(r)}</Td>
                <Td>
                  {r.windowOpensAt ?? '–'} to {r.windowClosesAt ?? '–'}
                </Td>
              </Tr>
            ))}
          </tbody>
        </Table>
      </section>
      <WatchDecisions caseId={caseId} rights={w.rights} decisions={w.decisions} canRecord={canRecord} onRecorded={() => watch.mutate()} />
      <WatchAlerts alerts={w.alerts} />
      <section aria-labelledby="watch-chart" className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
        <h3 id="watch-chart" className="mb-1 text-body font-semibold">
          The project&rsquo;s value against each right&rsquo;s boundary
        </h3>
        <p className="mb-3 text-caption text-ink-muted">Years after the approval on {w.followed.valuationDate}.</p>
        <BoundaryChart
          rights={w.boundaries}
          v0={w.followed.value}
          v0Label="V at approval"
          horizon={w.followed.horizon}
          currency={currency}
          observed={w.observations.map((o) => ({ t: yearsBetween(w.followed.valuationDate, o.observedOn), v: o.value }))}
        />
      </section>
      {canRecord ? (
        <section aria-labelledby="watch-record" className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
          <h3 id="watch-record" className="mb-3 text-body font-semibold">
            Record the project&rsquo;s value
          </h3>
          <form onSubmit={submit} noValidate className="flex flex-wrap items-start gap-4" aria-label="Record the project's value">
            <Input label="Date" type="date" value={form.date} onChange={(e) => setForm({ ...form, date: e.target.value })} error={problems.date} />
            <Input
              label={`Value (${currency})`}
              inputMode="decimal"
              value={form.value}
              onChange={(e) => setForm({ ...form, value: e.target.value })}
              error={problems.value}
            />
            <Input
              label="Source"
              placeholder="updated DCF, offer received…"
              value={form.source}
              onChange={(e) => setForm({ ...form, source: e.target.value })}
              error={problems.source}
            />
            <Input
              label="Note"
              className="min-w-64 flex-1"
              value={form.note}
              onChange={(e) => setForm({ ...form, note: e.target.value })}
              error={problems.note}
            />
            <Button type="submit" busy={busy} className="mt-5">
              Record
            </Button>
          </form>
          <WatchImport caseId={caseId} onRecorded={() => watch.mutate()} />
        </section>
      ) : null}
      {w.observations.length > 0 ? (
        <Table caption="Recorded values">
          <thead>
            <tr>
              <Th>Date</Th>
              <Th>Value</Th>
              <Th>Source</Th>
              <Th>Note</Th>
              <Th>By</Th>
            </tr>
          </thead>
          <tbody>
            {[...w.observations].reverse().map((o) => (
              <Tr key={o.id}>
                <Td className="whitespace-nowrap">{o.observedOn}</Td>
                <Td className="whitespace-nowrap">{formatMoney(o.value, currency)}</Td>
                <Td>{o.source || '–'}</Td>
                <Td>{o.note || '–'}</Td>
                <Td>{o.recordedBy ?? '–'}</Td>
              </Tr>
            ))}
          </tbody>
        </Table>
      ) : null}
      <ValuationCaution />
    </div>
  );
}
