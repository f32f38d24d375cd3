'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { FormProblem } from '@/components/form-problem';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Input } from '@/components/ui/input';
import { useToast } from '@/components/ui/toast';
import { sendJson } from '@/lib/api-client';

interface Props {
  projectId: string;
  name: string;
  description: string;
  status: 'active' | 'archived';
  canDelete: boolean;
}

type DialogKind = 'rename' | 'archive' | 'delete';

const titles = (name: string): Record<DialogKind, string> => ({
  rename: 'Rename the project',
  archive: `Archive “${name}”?`,
  delete: `Delete “${name}” for good?`,
});

/**
 * Rename or describe the project, and archive or restore it (PATCH /api/v1/projects/{id}).
 * Archiving hides nothing and deletes nothing: the portfolio lists it as archived, and its cases,
 * approvals and board packs stay as they are. A project none of whose cases was ever submitted
 * (a trial, a mistake) can be deleted (DELETE); the server refuses any other, saying why.
 */
export function ProjectActions({ projectId, name, description, status, canDelete }: Props) {
  const router = useRouter();
  const toast = useToast();
  const [dialog, setDialog] = useState<null | DialogKind>(null);
  const [draftName, setDraftName] = useState(name);
  const [draftDescription, setDraftDescription] = useState(description);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  const open = (kind: DialogKind) => {
    setDraftName(name);
    setDraftDescription(description);
    setProblem(null);
    setDialog(kind);
  };

  const save = async (change: { name?: string; description?: string; status?: 'active' | 'archived' }, done: string) => {
    setBusy(true);
    setProblem(null);
    try {
      await sendJson('PATCH', `/api/v1/projects/${projectId}`, change);
      setDialog(null);
      toast(done, 'success');
      router.refresh();
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The project was not changed.');
    } finally {
      setBusy(false);
    }
  };

  const remove = async () => {
    setBusy(true);
    setProblem(null);
    try {
      await sendJson('DELETE', `/api/v1/projects/${projectId}`);
      setDialog(null);
      toast(`“${name}” was deleted.`, 'success');
      router.push('/projects');
      router.refresh();
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The project was not deleted.');
    } finally {
      setBusy(false);
    }
  };

  const archived = status === 'archived';
  return (
    <div className="flex flex-wrap gap-2">
      <Button variant="secondary" onClick={() => open('rename')}>
        Rename…
      </Button>
      {archived ? (
        <Button variant="secondary" busy={busy} onClick={() => void save({ status: 'active' }, 'The project is active again.')}>
          Restore project
        </Button>
      ) : (
        <Button variant="secondary" onClick={() => open('archive')}>
          Archive…
        </Button>
      )}
      {canDelete ? (
        <Button variant="quiet" onClick={() => open('delete')}>
          Delete…
        </Button>
      ) : null}
      <Dialog open={dialog !== null} title={dialog ? titles(name)[dialog] : ''} onClose={() => setDialog(null)}>
        <form
          className="flex flex-col gap-4"
          onSubmit={(e) => {
            e.preventDefault();
            if (dialog === 'rename') void save({ name: draftName.trim(), description: draftDescription.trim() }, 'The project was renamed.');
            else if (dialog === 'delete') void remove();
            else void save({ status: 'archived' }, 'The project is archived.');
          }}
        >
          {dialog === 'rename' ? (
            <>
              <Input
                label="Project name"
                autoFocus
                // The current name is selected as the dialog opens: typing replaces it, an arrow key keeps it.
                onFocus={(e) => e.currentTarget.select()}
                required
                maxLength={120}
                value={draftName}
                onChange={(e) => setDraftName(e.target.value)}
              />
              <Input
                label="Description"
                maxLength={2000}
                value={draftDescription}
                onChange={(e) => setDraftDescription(e.target.value)}
                hint="Approved board packs keep the name they were approved under."
              />
            </>
          ) : dialog === 'delete' ? (
            <p className="text-ink-soft">
              The project, its cases and their stored valuations go for good. Only a project none of whose cases was ever submitted for review can be deleted;
              any other keeps its record, and you can archive it instead.
            </p>
          ) : (
            <p className="text-ink-soft">
              The portfolio will list it as archived. Nothing is deleted: its cases, approvals and board packs stay as they are, and you can restore it at any
              time.
            </p>
          )}
          <FormProblem message={problem} />
          <div className="flex justify-end gap-2">
            <Button variant="secondary" onClick={() => setDialog(null)}>
              Cancel
            </Button>
            <Button type="submit" variant={dialog === 'delete' ? 'danger' : 'primary'} busy={busy} disabled={dialog === 'rename' && draftName.trim() === ''}>
              {dialog === 'rename' ? 'Save name' : dialog === 'delete' ? 'Delete project' : 'Archive project'}
            </Button>
          </div>
        </form>
      </Dialog>
    </div>
  );
}
