'use client';

import { Panel } from '@/components/panel';
import { ConvergenceChart } from '@/components/charts/convergence-chart';
import { TornadoChart } from '@/components/charts/tornado-chart';
import { WaterfallChart } from '@/components/charts/waterfall-chart';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { ValuationCaution } from '@/components/valuation-caution';
import type { RightResult, ValuationResult } from '@/lattice';
import { decisionRule, ruleLines } from '@/lib/decision-rules';
import { formatMoney, formatPercent } from '@/lib/format';
import { premiumSplitText } from '@/lib/premium-split';
import { kindBesideName } from '@/lib/option-form';
import { palette } from '@/lib/palette';
import { describeSnaps } from '@/lib/snap-words';
import { treeLabels } from '@/lib/tree-words';
import { warningSentence } from '@/lib/warning-words';

/**
 * Probability of first exercise per year (summed over the steps of each year), as small bars;
 * the numbers are in a disclosure that opens by keyboard as well as by pointer (and in the
 * bars' tooltips).
 */
function TimingBars({ s }: { s: RightResult }) {
  const byYear = new Map<number, number>();
  for (const p of s.exerciseTiming) {
    const year = Math.min(Math.floor(p.t + 1e-9), 1000);
    byYear.set(year, (byYear.get(year) ?? 0) + p.probability);
  }
  const entries = [...byYear.entries()].sort((a, b) => a[0] - b[0]);
  if (entries.length === 0) return <span className="text-ink-muted">never</span>;
  const max = Math.max(...entries.map(([, p]) => p));
  const peak = entries.reduce((best, e) => (e[1] > best[1] ? e : best));
  return (
    <div className="flex items-start gap-2">
      <svg width={entries.length * 9} height="24" aria-hidden className="shrink-0">
        {entries.map(([year, p], k) => (
          <rect key={year} x={k * 9} y={24 - (p / max) * 22} width="7" height={Math.max(1, (p / max) * 22)} fill={palette.tide[500]}>
            <title>{`year ${year}–${year + 1}: ${formatPercent(p)}`}</title>
          </rect>
        ))}
      </svg>
      <div className="text-caption text-ink-soft">
        most likely year {peak[0]}–{peak[0] + 1} ({formatPercent(peak[1])})
        <details className="mt-0.5">
          <summary className="cursor-pointer text-tide-600 underline-offset-2 hover:underline">By year</summary>
          <ul className="figures mt-1" aria-label={`Probability of first exercise of ${s.id}, by year`}>
            {entries.map(([year, p]) => (
              <li key={year}>
                year {year}–{year + 1}: {formatPercent(p)}
              </li>
            ))}
          </ul>
        </details>
      </div>
    </div>
  );
}

/** What the valuation says: the bridge, each right's value and use, sensitivities, convergence, and the cautions. */
export function ResultsSection({ result, currency }: { result: ValuationResult; currency: string }) {
  const convergence = result.convergence;
  return (
    <div className="flex flex-col gap-6">
      <Panel
        title="From static to expanded NPV"
        note="Each right's stand-alone value (the right alone on the project), then what they are worth together beyond that: negative when they substitute, positive when they complement. The bars add up exactly before their labels are rounded."
      >
        <WaterfallChart result={result} currency={currency} />
      </Panel>
      {premiumSplitText(result, currency) ? (
        <p className="rounded-card border border-line bg-paper-raised px-5 py-3 text-body" data-testid="premium-split">
          {premiumSplitText(result, currency)}
        </p>
      ) : null}
      <Panel
        title="The rights, one by one"
        note="Stand-alone: the right alone on the project. Incremental: what it adds to the others. Probabilities are risk-neutral."
      >
        {result.rights.length === 0 ? (
          <p className="text-ink-soft">No rights: expanded NPV equals static NPV.</p>
        ) : (
          <Table caption="Rights: values and exercise">
            <thead>
              <tr>
                <Th>Right</Th>
                <Th numeric>Stand-alone</Th>
                <Th numeric>Incremental</Th>
                <Th numeric>Ever exercised</Th>
                <Th>When (first exercise)</Th>
              </tr>
            </thead>
            <tbody>
              {result.rights.map((s) => (
                <Tr key={s.id}>
                  <Td>
                    <span className="font-medium">{s.id}</span>
                    <KindBeside id={s.id} kind={s.kind} />
                    {ruleLines(decisionRule(s, currency)).map((text) => (
                      <p key={text} className="mt-0.5 max-w-xl text-caption text-ink-soft">
                        {text}
                      </p>
                    ))}
                  </Td>
                  <Td numeric>{formatMoney(s.standalone, currency)}</Td>
                  <Td numeric>{formatMoney(s.incremental, currency)}</Td>
                  <Td numeric>{formatPercent(s.exerciseProbability)}</Td>
                  <Td>
                    <TimingBars s={s} />
                  </Td>
                </Tr>
              ))}
            </tbody>
          </Table>
        )}
      </Panel>
      {result.sensitivities ? (
        <Panel
          title="Sensitivity of the expanded NPV"
          note="Each input moved both ways on its own, all else as valued: V0 and σ by ±10 %, the risk-free rate by ±1 point, the payout schedule and each right's money by ±10 %."
        >
          <TornadoChart sensitivities={result.sensitivities} base={result.expandedNpv} currency={currency} />
        </Panel>
      ) : null}
      <div className="grid grid-cols-[minmax(0,1fr)] gap-6 xl:grid-cols-2">
        {convergence ? (
          <Panel
            title="Convergence as steps grow"
            note={
              convergence.band
                ? `Expanded NPV at step counts that keep every decision date on the grid. Lattice error band ${formatMoney(convergence.band.low, currency, 2)} to ${formatMoney(convergence.band.high, currency, 2)}; extrapolated ${formatMoney(convergence.extrapolated, currency, 2)}.${convergence.datesOnGrid ? '' : ' Some dates fall between steps at this count, so the coarser counts are halvings.'}`
                : 'No coarser step count keeps every decision date on the grid, so the lattice error is not estimated.'
            }
          >
            <ConvergenceChart convergence={convergence} currency={currency} />
          </Panel>
        ) : null}
        <Panel title="The lattice" note={`${treeLabels[result.tree.kind]} tree, engine ${result.engineVersion}.`}>
          <dl className="figures grid grid-cols-3 gap-3 text-body">
            {[
              ['Steps', String(result.tree.steps)],
              ['Δt (years)', result.tree.dt.toFixed(4)],
              ['Discount a step', result.tree.discount.toFixed(6)],
              ['Up factor u', result.tree.u.toFixed(5)],
              ['Down factor d', result.tree.d.toFixed(5)],
              ['Risk-neutral p', result.tree.p.toFixed(5)],
            ].map(([k, v]) => (
              <div key={k}>
                <dt className="text-caption uppercase tracking-wide text-ink-muted">{k}</dt>
                <dd>{v}</dd>
              </div>
            ))}
          </dl>
          {result.snaps.length > 0 ? (
            <p className="mt-3 text-caption text-ink-soft">
              {describeSnaps(
                result.snaps,
                result.rights.map((r) => r.id),
              )}
            </p>
          ) : null}
        </Panel>
      </div>
      {result.warnings.length > 0 ? (
        <ul className="rounded-md border border-ember-500 bg-ember-100 px-4 py-2 text-caption text-ember-700">
          {result.warnings.map((w) => (
            <li key={w}>{warningSentence(w)}</li>
          ))}
        </ul>
      ) : null}
      <ValuationCaution />
    </div>
  );
}

/** The right's kind beside its name, unless the name is the kind's own. */
function KindBeside({ id, kind }: { id: string; kind: string }) {
  const beside = kindBesideName(id, kind);
  return beside ? <span className="ml-2 text-caption text-ink-muted">{beside}</span> : null;
}
