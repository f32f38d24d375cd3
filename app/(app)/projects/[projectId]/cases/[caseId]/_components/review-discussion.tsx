'use client';

import { useState } from 'react';
import useSWR from 'swr';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { Button } from '@/components/ui/button';
import { useToast } from '@/components/ui/toast';
import { getJson, sendJson } from '@/lib/api-client';
import { formatDateTime } from '@/lib/format';

interface Comment {
  id: string;
  section: string;
  body: string;
  author: string | null;
  createdAt: string;
}

const baseSections: [string, string][] = [
  ['general', 'The case as a whole'],
  ['cash-flows', 'Cash flows'],
  ['uncertainty', 'Uncertainty'],
  ['flexibility', 'Flexibility'],
  ['results', 'Results'],
  ['lattice', 'Lattice'],
];

/** The reviewers' and analyst's discussion of a case, each comment about the whole case, a tab, or one right. */
export function ReviewDiscussion({ caseId, rightIds, canComment }: { caseId: string; rightIds: string[]; canComment: boolean }) {
  const toast = useToast();
  const comments = useSWR<{ comments: Comment[] }>(`/api/v1/cases/${caseId}/comments`, getJson);
  const [section, setSection] = useState('general');
  const [body, setBody] = useState('');
  const [busy, setBusy] = useState(false);
  // Section keys are the API's (`option:<id>` names a right by the id the results use); the words
  // are the screen's. A comment on a right since removed or renamed still says which right it was.
  const sections: [string, string][] = [...baseSections, ...rightIds.map((n): [string, string] => [`option:${n}`, `Right: ${n}`])];
  const sectionLabel = (s: string) => sections.find(([k]) => k === s)?.[1] ?? s.replace(/^option:/, 'Right: ');

  const comment = async () => {
    setBusy(true);
    try {
      await sendJson('POST', `/api/v1/cases/${caseId}/comments`, { section, body });
      // What was sent leaves the box; words typed after it meanwhile stay for the next comment.
      setBody((now) => (now.startsWith(body) ? now.slice(body.length).trimStart() : now));
      await comments.mutate();
    } catch (error) {
      toast(error instanceof Error ? error.message : 'The comment was not saved.', 'error');
    } finally {
      setBusy(false);
    }
  };

  return (
    <section aria-labelledby="comments-heading" className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
      <h3 id="comments-heading" className="mb-3 text-body font-semibold">
        Discussion
      </h3>
      {comments.isLoading ? (
        <LoadingBlock label="Loading the discussion" lines={2} />
      ) : comments.error || !comments.data ? (
        <LoadError message={comments.error?.message ?? 'No answer from the server.'} onRetry={() => comments.mutate()} />
      ) : comments.data.comments.length ? (
        <ol className="mb-4 flex flex-col gap-3">
          {comments.data.comments.map((c) => (
            <li key={c.id} className="border-l-2 border-tide-300 pl-3">
              <p className="text-caption text-ink-muted">
                <span className="font-medium text-ink">{c.author ?? 'A former member'}</span> on {sectionLabel(c.section)} · {formatDateTime(c.createdAt)}
              </p>
              <p className="whitespace-pre-wrap">{c.body}</p>
            </li>
          ))}
        </ol>
      ) : (
        <p className="mb-4 text-ink-soft">No comments yet.</p>
      )}
      {canComment ? (
        <form
          onSubmit={(e) => {
            e.preventDefault();
            void comment();
          }}
          className="flex flex-col gap-2"
        >
          <label className="flex flex-col gap-1">
            <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">About</span>
            <select value={section} onChange={(e) => setSection(e.target.value)} className="h-10 rounded-md border border-line-strong bg-paper-raised px-3">
              {sections.map(([k, label]) => (
                <option key={k} value={k}>
                  {label}
                </option>
              ))}
            </select>
          </label>
          <label className="flex flex-col gap-1">
            <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">Comment</span>
            <textarea
              value={body}
              onChange={(e) => setBody(e.target.value)}
              rows={3}
              maxLength={4000}
              className="rounded-md border border-line-strong bg-paper-raised px-3 py-2"
            />
          </label>
          <div>
            <Button type="submit" variant="secondary" busy={busy} disabled={body.trim() === ''}>
              Add comment
            </Button>
          </div>
        </form>
      ) : null}
    </section>
  );
}
