'use client';

import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { Input } from '@/components/ui/input';
import { Select } from '@/components/ui/select';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { useToast } from '@/components/ui/toast';
import { ApiError, sendJson } from '@/lib/api-client';
import { dateOf } from '@/lib/watch/dates';

export interface RecordedDecision {
  id: string;
  rightId: string;
  decision: 'exercised' | 'declined' | 'postponed';
  decidedOn: string;
  reason: string;
  recordedBy: string | null;
}

const decisionWords: Record<RecordedDecision['decision'], string> = {
  exercised: 'Exercised: the right was used',
  declined: 'Declined: given up for good',
  postponed: 'Postponed: not now, still watched',
};

/**
 * The team's decisions on the approved rights: a form for those who may record them, and the
 * record itself. Exercised and declined are final; from their date the watched model starts in
 * the mode they made (lib/watch/clock.ts).
 */
export function WatchDecisions({
  caseId,
  rights,
  decisions,
  canRecord,
  onRecorded,
}: {
  caseId: string;
  rights: { id: string; name: string; status: string }[];
  decisions: RecordedDecision[];
  canRecord: boolean;
  onRecorded: () => Promise<unknown>;
}) {
  const toast = useToast();
  const open = rights.filter((r) => r.status !== 'exercised' && r.status !== 'declined');
  const [form, setForm] = useState({ right: open[0]?.id ?? '', decision: 'postponed', date: dateOf(new Date()), reason: '' });
  const [problems, setProblems] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);
  const nameOf = (id: string) => rights.find((r) => r.id === id)?.name ?? id;

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (!form.reason.trim()) return setProblems({ reason: 'Give the reason: the committee will read it.' });
    setBusy(true);
    setProblems({});
    try {
      await sendJson('POST', `/api/v1/cases/${caseId}/rights/${encodeURIComponent(form.right)}/decisions`, {
        decision: form.decision,
        date: form.date,
        reason: form.reason,
      });
      toast(`Recorded: “${nameOf(form.right)}” ${form.decision} on ${form.date}.`, 'success');
      setForm((f) => ({ ...f, reason: '' }));
      await onRecorded();
    } catch (error) {
      if (error instanceof ApiError) {
        setProblems(error.fieldProblems());
        toast(error.message, 'error');
      } else toast('The decision could not be recorded; try again.', 'error');
    } finally {
      setBusy(false);
    }
  };

  return (
    <section aria-labelledby="watch-decisions" className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
      <h3 id="watch-decisions" className="mb-1 text-body font-semibold">
        Decisions
      </h3>
      <p className="mb-3 text-caption text-ink-muted">
        Exercised and declined are final: from their date the rights are followed from the position the decision left. Postponed keeps the right watched.
      </p>
      {canRecord && open.length > 0 ? (
        <form onSubmit={submit} noValidate className="mb-4 flex flex-wrap items-start gap-4" aria-label="Record a decision">
          <Select
            label="Right"
            value={form.right}
            onChange={(e) => setForm({ ...form, right: e.target.value })}
            options={open.map((r) => ({ value: r.id, label: r.name }))}
          />
          <Select
            label="Decision"
            value={form.decision}
            onChange={(e) => setForm({ ...form, decision: e.target.value })}
            options={Object.entries(decisionWords).map(([value, label]) => ({ value, label }))}
          />
          <Input label="Date" type="date" value={form.date} onChange={(e) => setForm({ ...form, date: e.target.value })} error={problems.date} />
          <Input
            label="Reason"
            className="min-w-64 flex-1"
            value={form.reason}
            onChange={(e) => setForm({ ...form, reason: e.target.value })}
            error={problems.reason}
          />
          <Button type="submit" busy={busy} className="mt-5">
            Record decision
          </Button>
        </form>
      ) : null}
      {decisions.length === 0 ? (
        <p className="text-ink-soft">No decision recorded yet.</p>
      ) : (
        <Table caption="Decisions recorded">
          <thead>
            <tr>
              <Th>Date</Th>
              <Th>Right</Th>
              <Th>Decision</Th>
              <Th>Reason</Th>
              <Th>By</Th>
            </tr>
          </thead>
          <tbody>
            {[...decisions].reverse().map((d) => (
              <Tr key={d.id}>
                <Td className="whitespace-nowrap">{d.decidedOn}</Td>
                <Td>{nameOf(d.rightId)}</Td>
                <Td>{decisionWords[d.decision]}</Td>
                <Td>{d.reason}</Td>
                <Td>{d.recordedBy ?? '–'}</Td>
              </Tr>
            ))}
          </tbody>
        </Table>
      )}
    </section>
  );
}
