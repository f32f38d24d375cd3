import { formatDateTime } from '@/lib/format';

export interface VersionChangesJson {
  sinceReturned: { caseVersion: number; decidedAt: string; rows: { group: string; label: string; values: (string | null)[] }[] } | null;
  sameAsApproved: { caseVersion: number; decidedAt: string } | null;
}

/**
 * Beside a submission in review: what changed since the version the reviewers returned (inputs,
 * options, the volatility and its source, results), and whether these exact inputs were approved
 * before, so nobody re-approves or re-reads unknowingly.
 */
export function VersionChanges({ changes }: { changes: VersionChangesJson }) {
  const { sinceReturned, sameAsApproved } = changes;
  return (
    <div className="mt-4 flex flex-col gap-3">
      {sameAsApproved ? (
        <p role="note" className="rounded-md border-l-4 border-ember-500 bg-ember-100 px-3 py-2 text-ember-700">
          These inputs are identical to version {sameAsApproved.caseVersion}, approved on {formatDateTime(sameAsApproved.decidedAt)}.
        </p>
      ) : null}
      {sinceReturned ? (
        <section aria-labelledby="changes-heading">
          <h4 id="changes-heading" className="text-body font-semibold">
            What changed since version {sinceReturned.caseVersion} was returned ({formatDateTime(sinceReturned.decidedAt)})
          </h4>
          {sinceReturned.rows.length === 0 ? (
            <p className="mt-1 text-ink-soft">Nothing: the inputs and the figures are the same as in the returned version.</p>
          ) : (
            <table className="mt-2 w-full border-collapse text-left text-caption">
              <thead>
                <tr className="text-ink-soft">
                  <th scope="col" className="border-b border-line py-1 pr-3 font-semibold">
                    &nbsp;
                  </th>
                  <th scope="col" className="border-b border-line py-1 pr-3 font-semibold">
                    Returned (v{sinceReturned.caseVersion})
                  </th>
                  <th scope="col" className="border-b border-line py-1 font-semibold">
                    Now
                  </th>
                </tr>
              </thead>
              <tbody>
                {sinceReturned.rows.map((row) => (
                  <tr key={`${row.group}:${row.label}`}>
                    <th scope="row" className="border-b border-line py-1 pr-3 font-normal text-ink-soft">
                      {row.group}: {row.label}
                    </th>
                    <td className="figures border-b border-line py-1 pr-3">{row.values[0] ?? '–'}</td>
                    <td className="figures border-b border-line py-1 font-semibold">{row.values[1] ?? '–'}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </section>
      ) : null}
    </div>
  );
}
