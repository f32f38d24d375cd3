import Link from 'next/link';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { formatMoney } from '@/lib/format';
import type { watchList } from '@/lib/watch/follow';
import { distanceWords, statusWords } from '@/lib/watch/status-words';

type Row = Awaited<ReturnType<typeof watchList>>[number];

/** Rights across the portfolio that are in their region or near their boundary, most urgent first. */
export function WatchList({ rows }: { rows: Row[] }) {
  const sorted = [...rows].sort((a, b) =>
    a.status === b.status ? Math.abs(a.distanceSd ?? 0) - Math.abs(b.distanceSd ?? 0) : a.status === 'in_region' ? -1 : 1,
  );
  return (
    <section aria-labelledby="watch-list" className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
      <h2 id="watch-list" className="mb-1">
        Rights to act on
      </h2>
      <p className="mb-3 text-caption text-ink-muted">
        Approved rights whose project value, as last recorded, is in their region (the model says use them now) or within one standard deviation of it.
      </p>
      {sorted.length === 0 ? (
        <p className="text-ink-soft">No approved right is in its region or near its boundary at the values recorded.</p>
      ) : (
        <Table caption="Rights to act on">
          <thead>
            <tr>
              <Th>Project and case</Th>
              <Th>Right</Th>
              <Th>Status</Th>
              <Th>Value on</Th>
              <Th>Critical value</Th>
              <Th>Distance</Th>
            </tr>
          </thead>
          <tbody>
            {sorted.map((r) => (
              <Tr key={`${r.caseId}:${r.id}`}>
                <Td>
                  <Link href={`/projects/${r.projectId}/cases/${r.caseId}`} className="text-tide-600 underline">
                    {r.projectName} · {r.caseName}
                  </Link>
                </Td>
                <Td>{r.name}</Td>
                <Td>{statusWords[r.status]}</Td>
                <Td>
                  {formatMoney(r.value, r.currency)} <span className="text-caption text-ink-muted">(observed {r.valueOn})</span>
                </Td>
                <Td>{r.critical === null ? '–' : formatMoney(r.critical, r.currency)}</Td>
                <Td>{distanceWords(r)}</Td>
              </Tr>
            ))}
          </tbody>
        </Table>
      )}
    </section>
  );
}
