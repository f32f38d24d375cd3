'use client';

import {
  columnFilteringFeature,
  createColumnHelper,
  createFilteredRowModel,
  createSortedRowModel,
  filterFn_equalsString,
  filterFn_includesString,
  globalFilteringFeature,
  rowSortingFeature,
  sortFn_alphanumeric,
  tableFeatures,
  useTable,
} from '@tanstack/react-table';
import Link from 'next/link';
import { useState } from 'react';
import { OlderEngineNote } from '@/components/older-engine-note';
import { formatDate, formatMoney } from '@/lib/format';
import type { ProjectSummaryJson } from '@/lib/project-summary';
import { DownloadLink } from '@/components/ui/download-link';
import { useInteractive } from '@/components/ui/use-interactive';

const features = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  globalFilteringFeature,
  sortedRowModel: createSortedRowModel(),
  filteredRowModel: createFilteredRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric },
  filterFns: { includesString: filterFn_includesString, equalsString: filterFn_equalsString },
});

const helper = createColumnHelper<typeof features, ProjectSummaryJson>();
const money = (pick: (p: ProjectSummaryJson) => number | undefined) => (p: ProjectSummaryJson) => pick(p) ?? Number.NEGATIVE_INFINITY;

const columns = helper.columns([
  helper.accessor('name', {
    header: 'Project',
    sortFn: 'alphanumeric',
    cell: (info) => (
      <Link href={`/projects/${info.row.original.id}`} className="font-medium text-tide-600 underline-offset-2 hover:underline">
        {info.getValue()}
      </Link>
    ),
  }),
  helper.accessor('status', {
    header: 'Status',
    filterFn: 'equalsString',
    enableGlobalFilter: false,
    cell: (info) => <StatusBadge status={info.getValue()} />,
  }),
  helper.accessor((p) => p.approved?.decidedAt ?? '', {
    id: 'approval',
    header: 'Approval',
    enableGlobalFilter: false,
    sortUndefined: 'last',
    cell: (info) => <ApprovalCell project={info.row.original} />,
  }),
  helper.accessor(
    money((p) => p.latest?.staticNpv),
    {
      id: 'staticNpv',
      header: 'Static NPV',
      enableGlobalFilter: false,
      sortUndefined: 'last',
      cell: (info) => formatMoney(info.row.original.latest?.staticNpv, info.row.original.currency),
    },
  ),
  helper.accessor(
    money((p) => p.latest?.optionPremium),
    {
      id: 'optionPremium',
      header: 'Option premium',
      enableGlobalFilter: false,
      cell: (info) => formatMoney(info.row.original.latest?.optionPremium, info.row.original.currency),
    },
  ),
  helper.accessor(
    money((p) => p.latest?.expandedNpv),
    {
      id: 'expandedNpv',
      header: 'Expanded NPV',
      enableGlobalFilter: false,
      cell: (info) => <strong className="font-semibold">{formatMoney(info.row.original.latest?.expandedNpv, info.row.original.currency)}</strong>,
    },
  ),
  helper.accessor((p) => p.ownerName ?? '', { id: 'owner', header: 'Owner', sortFn: 'alphanumeric' }),
  helper.accessor((p) => p.latest?.valuedAt ?? '', {
    id: 'valuedAt',
    header: 'Last valued',
    enableGlobalFilter: false,
    cell: (info) => {
      const latest = info.row.original.latest;
      if (!latest) return 'Not yet valued';
      return (
        <>
          {formatDate(latest.valuedAt)} · {latest.caseName} v{latest.caseVersion}
          {latest.caseVersion < latest.currentVersion ? ' (edited since)' : ''}
          {/* Every reader of the list is told, not only those who may re-value (the banner above). */}
          <OlderEngineNote engineVersion={latest.engineVersion} />
        </>
      );
    },
  }),
]);

const numericColumns = new Set(['staticNpv', 'optionPremium', 'expandedNpv']);

function StatusBadge({ status }: { status: ProjectSummaryJson['status'] }) {
  return (
    <span className={`rounded px-2 py-0.5 text-caption font-medium ${status === 'active' ? 'bg-moss-100 text-moss-700' : 'bg-paper-sunk text-ink-soft'}`}>
      {status === 'active' ? 'Active' : 'Archived'}
    </span>
  );
}

/** What the committee last approved for the project, with its board pack, and what waits for review. */
function ApprovalCell({ project }: { project: ProjectSummaryJson }) {
  const { approved, inReview } = project;
  const waiting = inReview > 0 ? `${inReview} ${inReview === 1 ? 'case' : 'cases'} in review` : null;
  if (!approved) return <span className="text-ink-soft">{waiting ?? 'Not approved yet'}</span>;
  return (
    <div className="min-w-48">
      <span className="font-medium text-moss-700">Approved</span> {formatDate(approved.decidedAt)}
      <span className="block text-caption text-ink-soft">
        {approved.caseName} v{approved.caseVersion} · {formatMoney(approved.expandedNpv, project.currency)}
      </span>
      <DownloadLink
        href={`/api/v1/cases/${approved.caseId}/board-pack?size=A4`}
        className="text-caption font-medium text-tide-600 underline underline-offset-2"
        label={`Board pack of ${project.name}, ${approved.caseName} version ${approved.caseVersion} (PDF)`}
      >
        Board pack (PDF)
      </DownloadLink>
      {waiting ? <span className="block text-caption text-ink-muted">{waiting}</span> : null}
    </div>
  );
}

/** The organisation's projects with their headline figures: sortable by any column, filterable by name, owner and status. */
export function PortfolioTable({ projects }: { projects: ProjectSummaryJson[] }) {
  const [search, setSearch] = useState('');
  // Sorting is this page's script: its headers wait for it.
  const interactive = useInteractive();
  const [status, setStatus] = useState('');
  const table = useTable({
    features,
    columns,
    data: projects,
    state: { globalFilter: search, columnFilters: status ? [{ id: 'status', value: status }] : [] },
    globalFilterFn: 'includesString',
    initialState: { sorting: [{ id: 'expandedNpv', desc: true }] },
  });
  const rows = table.getRowModel().rows;
  return (
    <div>
      <div className="mb-3 flex flex-wrap items-end gap-4">
        <label className="flex flex-col gap-1">
          <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">Find a project</span>
          <input
            type="search"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
            placeholder="Name or owner"
            className="h-10 w-64 rounded-md border border-line-strong bg-paper-raised px-3"
          />
        </label>
        <label className="flex flex-col gap-1">
          <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">Status</span>
          <select value={status} onChange={(e) => setStatus(e.target.value)} className="h-10 rounded-md border border-line-strong bg-paper-raised px-3">
            <option value="">All</option>
            <option value="active">Active</option>
            <option value="archived">Archived</option>
          </select>
        </label>
        <p className="ml-auto text-caption text-ink-muted" aria-live="polite">
          {rows.length} of {projects.length} projects
        </p>
      </div>
      <div className="relative overflow-x-auto rounded-card border border-line bg-paper-raised shadow-card">
        <table className="w-full border-collapse text-left text-body">
          <caption className="sr-only">Projects with their latest valuation; column headers sort.</caption>
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const numeric = numericColumns.has(header.column.id);
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none'}
                      className={`border-b border-line bg-paper-sunk px-4 py-2 text-caption font-semibold uppercase tracking-wide text-ink-soft ${numeric ? 'text-right' : ''}`}
                    >
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        disabled={!interactive}
                        className="inline-flex items-center gap-1 uppercase hover:text-ink"
                      >
                        <table.FlexRender header={header} />
                        <span aria-hidden className="w-3">
                          {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : ''}
                        </span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {rows.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-4 py-8 text-center text-ink-soft">
                  No project matches these filters.
                </td>
              </tr>
            ) : (
              rows.map((row) => (
                <tr key={row.id} className="hover:bg-tide-50/40 last:[&>td]:border-b-0">
                  {row.getAllCells().map((cell) => (
                    <td
                      key={cell.id}
                      className={`border-b border-line px-4 py-2.5 ${numericColumns.has(cell.column.id) ? 'figures whitespace-nowrap text-right' : ''}`}
                    >
                      <table.FlexRender cell={cell} />
                    </td>
                  ))}
                </tr>
              ))
            )}
          </tbody>
        </table>
      </div>
    </div>
  );
}
