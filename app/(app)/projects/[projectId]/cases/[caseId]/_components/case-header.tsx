'use client';

import Link from 'next/link';
import { StatusBadge } from '@/components/status-badge';
import { Button } from '@/components/ui/button';
import { formatDateTime } from '@/lib/format';
import type { CaseStatus } from '@/lib/review/transitions';
import { DownloadLink } from '@/components/ui/download-link';

interface Props {
  caseId: string;
  projectId: string;
  projectName: string;
  name: string;
  onName: (name: string) => void;
  status: CaseStatus;
  version: number;
  dirty: boolean;
  /** The latest stored run; undefined when there is none or the runs are still loading (`runsLoaded`). */
  latestRun?: { createdAt: string; createdBy: string | null; caseVersion: number };
  runsLoaded: boolean;
  readOnly: boolean;
  canEdit: boolean;
  canDecide: boolean;
  saving: boolean;
  onSave: () => void;
  valuing: boolean;
  canValue: boolean;
  onValue: () => void;
  revising: boolean;
  onRevise: () => void;
}

/** The case's header: where it sits, its name, status and version, and what the reader may do with it now. */
export function CaseHeader({
  caseId,
  projectId,
  projectName,
  name,
  onName,
  status,
  version,
  dirty,
  latestRun,
  runsLoaded,
  readOnly,
  canEdit,
  canDecide,
  saving,
  onSave,
  valuing,
  canValue,
  onValue,
  revising,
  onRevise,
}: Props) {
  return (
    <div>
      <nav aria-label="Breadcrumb" className="mb-2 text-caption text-ink-muted">
        <Link href="/projects" className="hover:underline">
          Projects
        </Link>{' '}
        /{' '}
        <Link href={`/projects/${projectId}`} className="hover:underline">
          {projectName}
        </Link>{' '}
        / {name || 'Untitled case'}
      </nav>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div className="flex flex-col gap-1">
          {readOnly ? (
            <h1>{name}</h1>
          ) : (
            // The page's heading is the name being edited (for those who move by headings).
            <>
              <h1 className="sr-only">{name || 'Untitled case'}</h1>
              <label className="flex flex-col">
                <span className="sr-only">Case name</span>
                <input
                  value={name}
                  onChange={(e) => onName(e.target.value)}
                  maxLength={120}
                  // As wide as the name (within the page), so a long name is never cut off.
                  size={Math.max(12, name.length + 2)}
                  className="-ml-2 max-w-full rounded-md border border-transparent bg-transparent px-2 py-1 text-title hover:border-line focus:border-tide-500"
                />
              </label>
            </>
          )}
          <p className="flex flex-wrap items-center gap-2 text-caption text-ink-muted">
            <StatusBadge status={status} />
            Version {version}
            {dirty ? ' · unsaved changes' : ' · saved'}
            {latestRun
              ? ` · last stored valuation ${formatDateTime(latestRun.createdAt)} by ${latestRun.createdBy ?? 'someone'} (version ${latestRun.caseVersion})`
              : runsLoaded
                ? ' · never valued on the server'
                : ''}
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-3">
          <DownloadLink
            href={`/api/v1/cases/${caseId}/export.xlsx`}
            className="text-tide-600 underline"
            title="Inputs, cash flows, settings, rights, results and the first lattice steps of the saved case"
          >
            Export workbook
          </DownloadLink>
          {readOnly && canEdit && status === 'approved' ? (
            <div className="flex flex-wrap items-center gap-3 rounded-md bg-paper-sunk px-3 py-2 text-caption text-ink-soft">
              <span>Approved: changing it starts a revision, a new draft version. The approved version and its board pack stay as they are.</span>
              <Button variant="secondary" onClick={onRevise} busy={revising}>
                Start a revision
              </Button>
            </div>
          ) : readOnly ? (
            <p className="rounded-md bg-paper-sunk px-3 py-2 text-caption text-ink-soft">
              {canEdit
                ? 'In review: the case is frozen until a reviewer returns it.'
                : canDecide && status === 'in_review'
                  ? 'In review: read the case, then decide in the Review tab.'
                  : 'Read-only: your role can read this case but not change it.'}
            </p>
          ) : (
            <div className="flex gap-2">
              <Button variant="secondary" onClick={onSave} busy={saving} disabled={!dirty}>
                Save
              </Button>
              <Button onClick={onValue} busy={valuing} disabled={!canValue}>
                Value case
              </Button>
            </div>
          )}
        </div>
      </div>
    </div>
  );
}
