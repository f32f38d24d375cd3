'use client';

import { useState } from 'react';
import useSWR from 'swr';
import { FormProblem } from '@/components/form-problem';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { StatusBadge } from '@/components/status-badge';
import { useToast } from '@/components/ui/toast';
import type { CaseStatus } from '@/lib/review/transitions';
import { getJson, sendJson } from '@/lib/api-client';
import { formatDateTime } from '@/lib/format';
import { readingOfFigures } from '@/lib/figures-reading';
import { transitions, type ReviewAction } from '@/lib/review/transitions';
import { SubmitDialog } from './submit-dialog';
import { VersionChanges, type VersionChangesJson } from './version-changes';
import { ReviewDiscussion } from './review-discussion';
import { ReviewHistory, type Snapshot } from './review-history';
import { DownloadLink } from '@/components/ui/download-link';

export interface ReviewRights {
  canSubmit: boolean;
  canDecide: boolean;
  canComment: boolean;
  /** May re-run stored runs (model validation is a reviewer's job as much as an analyst's). */
  canRerun: boolean;
  /** May start and cancel cross-checks (the same independent review). */
  canCrossCheck: boolean;
}

interface Props {
  caseId: string;
  currency: string;
  status: CaseStatus;
  rightIds: string[];
  rights: ReviewRights;
  /** Saves pending edits first; false when saving did not work. */
  beforeSubmit: () => Promise<boolean>;
  onStatus: (status: CaseStatus) => void;
  /** The figures on screen, for Leeway's reading offered when writing the recommendation; null while there are none. */
  figures: { staticNpv: number; expandedNpv: number; optionPremium: number } | null;
  /** What the committee would read as missing in the case on screen, shown when submitting. */
  gaps: string[];
}

/**
 * The case's review: its status and history of snapshots, the reviewers' discussion by section,
 * and the actions the signed-in role may take (submit; approve or return with a reason), plus
 * the board pack of the latest approved snapshot.
 */
export function ReviewPanel({ caseId, currency, status, rightIds, rights, beforeSubmit, onStatus, figures, gaps }: Props) {
  const toast = useToast();
  const history = useSWR<{ status: CaseStatus; snapshots: Snapshot[]; changes: VersionChangesJson | null }>(`/api/v1/cases/${caseId}/snapshots`, getJson);
  const [busy, setBusy] = useState<null | ReviewAction>(null);
  const [returning, setReturning] = useState(false);
  const [submitting, setSubmitting] = useState(false);
  const [recommendation, setRecommendation] = useState('');
  const [reason, setReason] = useState('');
  const [problem, setProblem] = useState<string | null>(null);

  const act = async (kind: ReviewAction) => {
    setBusy(kind);
    setProblem(null);
    try {
      if (kind === 'submit' && !(await beforeSubmit())) return;
      const body = kind === 'return' ? { reason } : kind === 'submit' ? { recommendation } : undefined;
      await sendJson('POST', `/api/v1/cases/${caseId}/${kind}`, body);
      onStatus(transitions[kind].to);
      setReturning(false);
      setReason('');
      setSubmitting(false);
      setRecommendation('');
      toast(
        kind === 'submit'
          ? 'Submitted for review; the reviewers have been told by e-mail.'
          : kind === 'approve'
            ? 'Approved. The board pack is ready.'
            : kind === 'return'
              ? 'Returned to the analyst with your reason.'
              : 'Submission withdrawn. The case is a draft again; the reviewers no longer see it waiting.',
        'success',
      );
      await history.mutate();
    } catch (error) {
      const message = error instanceof Error ? error.message : 'That did not work.';
      if (kind === 'return' || kind === 'submit') setProblem(message);
      else toast(message, 'error');
      await history.mutate();
    } finally {
      setBusy(null);
    }
  };

  if (history.isLoading) return <LoadingBlock label="Loading the review" />;
  if (history.error || !history.data) return <LoadError message={history.error?.message ?? 'No answer from the server.'} onRetry={() => history.mutate()} />;
  const snapshots = history.data.snapshots;
  const latest = snapshots[0];
  const approved = snapshots.find((s) => s.status === 'approved');
  const reading = figures ? readingOfFigures(figures, currency) : null;

  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-6 xl:grid-cols-[minmax(0,1fr)_26rem]">
      <div className="flex flex-col gap-6">
        <section className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
          <div className="flex flex-wrap items-center gap-3">
            <h3 className="text-body font-semibold">Status</h3>
            <StatusBadge status={status} />
          </div>
          {status === 'returned' && latest?.decisionReason ? (
            <p className="mt-3 rounded-md border-l-4 border-brick-500 bg-brick-100 px-3 py-2 text-brick-700">
              Returned by {latest.decidedBy ?? 'a reviewer'} on {formatDateTime(latest.decidedAt!)}: “{latest.decisionReason}”
            </p>
          ) : null}
          {status === 'in_review' ? (
            <p className="mt-2 text-ink-soft">The case is frozen for review: nobody can edit it until a reviewer returns it or its analyst withdraws it.</p>
          ) : null}
          {status === 'in_review' && latest?.status === 'in_review' && latest.recommendation ? (
            <blockquote className="mt-3 border-l-4 border-tide-500 bg-tide-50/60 px-3 py-2">
              <p className="text-caption font-semibold uppercase tracking-wide text-ink-soft">Recommendation of {latest.submittedBy ?? 'the analyst'}</p>
              <p className="mt-1 whitespace-pre-line">{latest.recommendation}</p>
            </blockquote>
          ) : null}
          {status === 'in_review' && history.data.changes ? <VersionChanges changes={history.data.changes} /> : null}
          <div className="mt-4 flex flex-wrap gap-2">
            {rights.canSubmit && (status === 'draft' || status === 'returned') ? (
              <Button
                onClick={() => {
                  setProblem(null);
                  setSubmitting(true);
                }}
              >
                Submit for review…
              </Button>
            ) : null}
            {rights.canSubmit && status === 'in_review' && latest?.status === 'in_review' && latest.submittedByYou ? (
              <Button variant="secondary" onClick={() => void act('withdraw')} busy={busy === 'withdraw'}>
                Withdraw my submission
              </Button>
            ) : null}
            {rights.canDecide && status === 'in_review' ? (
              <>
                <Button onClick={() => void act('approve')} busy={busy === 'approve'}>
                  Approve
                </Button>
                <Button variant="secondary" onClick={() => setReturning(true)}>
                  Return to the analyst…
                </Button>
              </>
            ) : null}
            {approved ? (
              <>
                <DownloadLink
                  className="inline-flex items-center rounded-md border border-line-strong px-4 py-2 font-medium hover:bg-paper-sunk"
                  href={`/api/v1/cases/${caseId}/board-pack?size=A4`}
                >
                  Board pack (PDF, A4)
                </DownloadLink>
                <DownloadLink
                  className="inline-flex items-center rounded-md border border-line-strong px-4 py-2 font-medium hover:bg-paper-sunk"
                  href={`/api/v1/cases/${caseId}/board-pack?size=LETTER`}
                >
                  Board pack (PDF, US Letter)
                </DownloadLink>
              </>
            ) : null}
          </div>
          {approved ? (
            <p className="mt-2 text-caption text-ink-muted">
              The board pack shows the snapshot approved on {formatDateTime(approved.decidedAt!)}, whatever was edited since.
            </p>
          ) : null}
        </section>
      </div>
      <ReviewDiscussion caseId={caseId} rightIds={rightIds} canComment={rights.canComment} />
      <ReviewHistory snapshots={snapshots} currency={currency} />
      <SubmitDialog
        open={submitting}
        text={recommendation}
        onText={setRecommendation}
        suggestion={reading ? `${reading.headline} ${reading.body}` : null}
        gaps={gaps}
        busy={busy === 'submit'}
        problem={submitting ? problem : null}
        onSubmit={() => void act('submit')}
        onClose={() => setSubmitting(false)}
      />
      <Dialog open={returning} title="Return the case to the analyst" onClose={() => setReturning(false)}>
        <form
          onSubmit={(e) => {
            e.preventDefault();
            void act('return');
          }}
          className="flex flex-col gap-3"
        >
          <label className="flex flex-col gap-1">
            <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">Reason (sent to the analyst)</span>
            <textarea
              autoFocus
              value={reason}
              onChange={(e) => setReason(e.target.value)}
              rows={4}
              maxLength={2000}
              className="rounded-md border border-line-strong bg-paper-raised px-3 py-2"
            />
          </label>
          <FormProblem message={problem} />
          <div className="flex justify-end gap-2">
            <Button variant="secondary" onClick={() => setReturning(false)}>
              Cancel
            </Button>
            <Button type="submit" variant="danger" busy={busy === 'return'} disabled={reason.trim().length < 3}>
              Return the case
            </Button>
          </div>
        </form>
      </Dialog>
    </div>
  );
}
