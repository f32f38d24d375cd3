'use client';

/**
 * The case as the server keeps it, seen from the editor: the draft on screen and whether it is
 * saved, the version and status, and the four things that write (save, value, start a revision,
 * and saving before a submission). A save based on an older version is refused by the server
 * (409) and kept as a conflict for the editor to show; every other failure is a toast, and the
 * draft stays as typed.
 */
import { useCallback, useRef, useState } from 'react';
import useSWR from 'swr';
import { useToast } from '@/components/ui/toast';
import { ApiError, getJson, sendJson } from '@/lib/api-client';
import type { CaseJson } from '@/lib/case-json';
import { formatMoney } from '@/lib/format';
import type { CaseStatus } from '@/lib/review/transitions';
import type { CaseInput } from '@/lib/validations/case';

export interface RunSummary {
  id: string;
  caseVersion: number;
  createdAt: string;
  createdBy: string | null;
  expandedNpv: number;
}

function toInput(c: CaseJson): CaseInput {
  return { name: c.name, cashFlows: c.cashFlows, settings: c.settings, options: c.options };
}

export function useCaseRecord({ caseId, currency, initial, reload }: { caseId: string; currency: string; initial: CaseJson; reload: () => void }) {
  const toast = useToast();
  const [draft, setDraft] = useState<CaseInput>(() => toInput(initial));
  const [version, setVersion] = useState(initial.version);
  const [status, setStatus] = useState<CaseStatus>(initial.status as CaseStatus);
  const [dirty, setDirty] = useState(false);
  const [saving, setSaving] = useState(false);
  const [valuing, setValuing] = useState(false);
  const [revising, setRevising] = useState(false);
  const [conflict, setConflict] = useState<string | null>(null);
  const runs = useSWR<{ runs: RunSummary[] }>(`/api/v1/cases/${caseId}/valuations`, getJson, { revalidateOnFocus: false });

  // Counts edits, so a save that answers after the user typed on does not call those edits saved.
  const edits = useRef(0);
  const update = (patch: Partial<CaseInput>) => {
    setDraft((d) => ({ ...d, ...patch }));
    edits.current += 1;
    setDirty(true);
  };
  const markUnsaved = useCallback(() => {
    edits.current += 1;
    setDirty(true);
  }, []);

  /** `blocked` says why the draft cannot be saved as it stands (a field that is not a value), or null. */
  const save = async (blocked: string | null): Promise<boolean> => {
    if (blocked) {
      toast(blocked, 'error');
      return false;
    }
    setSaving(true);
    const editsSent = edits.current;
    try {
      const { case: saved } = await sendJson<{ case: CaseJson }>('PATCH', `/api/v1/cases/${caseId}`, { ...draft, version });
      setVersion(saved.version);
      setStatus(saved.status as CaseStatus);
      // Edits typed while the save was on its way are not in it: the draft stays unsaved.
      const typedOn = edits.current !== editsSent;
      setDirty(typedOn);
      setConflict(null);
      toast(typedOn ? `Saved as version ${saved.version}; the changes made since are not saved yet.` : `Saved as version ${saved.version}.`, 'success');
      return true;
    } catch (error) {
      if (error instanceof ApiError && error.status === 409) setConflict(error.message);
      else toast(error instanceof Error ? error.message : 'Saving did not work.', 'error');
      return false;
    } finally {
      setSaving(false);
    }
  };

  /** Before a submission: unsaved edits are saved first, so the reviewers see what is on screen. */
  const readyToSubmit = async (blocked: string | null): Promise<boolean> => {
    if (dirty) return save(blocked);
    if (blocked) toast(blocked, 'error');
    return !blocked;
  };

  const valueCase = async (blocked: string | null) => {
    if (dirty && !(await save(blocked))) return;
    setValuing(true);
    try {
      const { run } = await sendJson<{ run: { result: { expandedNpv: number } } }>('POST', `/api/v1/cases/${caseId}/valuations`);
      toast(`Valuation stored: expanded NPV ${formatMoney(run.result.expandedNpv, currency)}.`, 'success');
      await runs.mutate();
    } catch (error) {
      toast(error instanceof Error ? error.message : 'Valuing did not work.', 'error');
    } finally {
      setValuing(false);
    }
  };

  const startRevision = async () => {
    setRevising(true);
    try {
      const { case: revised } = await sendJson<{ case: CaseJson }>('POST', `/api/v1/cases/${caseId}/revisions`);
      toast(`Revision started: version ${revised.version} is a draft. The approved version and its board pack stay as they are.`, 'success');
      reload();
    } catch (error) {
      toast(error instanceof Error ? error.message : 'The revision could not be started.', 'error');
    } finally {
      setRevising(false);
    }
  };

  return {
    draft,
    update,
    version,
    status,
    setStatus,
    dirty,
    markUnsaved,
    conflict,
    saving,
    save,
    readyToSubmit,
    valuing,
    valueCase,
    revising,
    startRevision,
    latestRun: runs.data?.runs[0],
    runsLoaded: runs.data !== undefined,
  };
}
