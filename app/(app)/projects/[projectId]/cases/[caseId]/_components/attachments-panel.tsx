'use client';

import { useRef, useState } from 'react';
import useSWR from 'swr';
import { FormProblem } from '@/components/form-problem';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { Button } from '@/components/ui/button';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { useToast } from '@/components/ui/toast';
import { getJson, sendForm, sendJson } from '@/lib/api-client';
import { formatDateTime } from '@/lib/format';

interface Attachment {
  id: string;
  filename: string;
  kind: string;
  size: number;
  uploadedBy: string | null;
  uploadedAt: string;
}

const kb = (bytes: number) => (bytes < 1024 * 1024 ? `${Math.max(1, Math.round(bytes / 1024))} KB` : `${(bytes / 1024 / 1024).toFixed(1)} MB`);

/** Supporting documents of the case (comparables, quotes, board minutes): PDF, XLSX, CSV or PNG up to 10 MB. */
export function AttachmentsPanel({ caseId, canEdit }: { caseId: string; canEdit: boolean }) {
  const toast = useToast();
  const list = useSWR<{ attachments: Attachment[] }>(`/api/v1/cases/${caseId}/attachments`, getJson);
  const input = useRef<HTMLInputElement>(null);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  const upload = async (file: File) => {
    setBusy(true);
    setProblem(null);
    try {
      const form = new FormData();
      form.append('file', file);
      await sendForm(`/api/v1/cases/${caseId}/attachments`, form);
      toast(`Attached “${file.name}”.`, 'success');
      await list.mutate();
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The upload did not work.');
    } finally {
      setBusy(false);
      if (input.current) input.current.value = '';
    }
  };

  const remove = async (a: Attachment) => {
    try {
      await sendJson('DELETE', `/api/v1/attachments/${a.id}`);
      toast(`Removed “${a.filename}”.`, 'success');
      await list.mutate();
    } catch (error) {
      toast(error instanceof Error ? error.message : 'Removing did not work.', 'error');
    }
  };

  if (list.isLoading) return <LoadingBlock label="Loading documents" />;
  if (list.error || !list.data) return <LoadError message={list.error?.message ?? 'No answer from the server.'} onRetry={() => list.mutate()} />;
  return (
    <div className="flex max-w-4xl flex-col gap-4">
      {canEdit ? (
        <label className="flex flex-col gap-1">
          <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">Attach a document (PDF, XLSX, CSV or PNG, up to 10 MB)</span>
          <input
            ref={input}
            type="file"
            disabled={busy}
            accept=".pdf,.xlsx,.csv,.png"
            onChange={(e) => {
              const file = e.target.files?.[0];
              if (file) void upload(file);
            }}
            className="text-body file:mr-3 file:rounded-md file:border file:border-line-strong file:bg-paper-raised file:px-3 file:py-1.5"
          />
        </label>
      ) : null}
      <FormProblem message={problem} />
      {list.data.attachments.length === 0 ? (
        <p className="text-ink-soft">No supporting documents yet.</p>
      ) : (
        <Table caption="Supporting documents">
          <thead>
            <tr>
              <Th>Document</Th>
              <Th>Type</Th>
              <Th numeric>Size</Th>
              <Th>Uploaded</Th>
              {canEdit ? <Th className="text-right">Actions</Th> : null}
            </tr>
          </thead>
          <tbody>
            {list.data.attachments.map((a) => (
              <Tr key={a.id}>
                <Td>
                  <a href={`/api/v1/attachments/${a.id}`} className="font-medium text-tide-600 hover:underline">
                    {a.filename}
                  </a>
                </Td>
                <Td className="uppercase">{a.kind}</Td>
                <Td numeric>{kb(a.size)}</Td>
                <Td>
                  {formatDateTime(a.uploadedAt)}
                  <span className="block text-caption text-ink-muted">by {a.uploadedBy ?? 'a former member'}</span>
                </Td>
                {canEdit ? (
                  <Td className="text-right">
                    <Button variant="quiet" onClick={() => void remove(a)} aria-label={`Remove ${a.filename}`}>
                      Remove
                    </Button>
                  </Td>
                ) : null}
              </Tr>
            ))}
          </tbody>
        </Table>
      )}
    </div>
  );
}
