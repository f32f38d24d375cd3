'use client';

import type { ModelIssue, NodeExplanation } from '@/lattice';
import { formatNumber } from '@/lib/format';
import { modeLabel } from '@/lib/mode-words';

const n4 = (x: number) => formatNumber(x, 4);

/**
 * Why a node is worth what it is, three equivalent ways (docs/engine.md §6): the risk-neutral
 * expectation of the next step, the replicating position (Δ units of the project's value and B
 * in risk-free debt) that pays the same, and the exercise rule applied to the result.
 */
export function NodeInspector({ explanation, issues, computing }: { explanation: NodeExplanation | null; issues: ModelIssue[] | null; computing: boolean }) {
  if (issues)
    return (
      <p role="alert" className="text-brick-700">
        {issues[0]?.message}
      </p>
    );
  if (!explanation) return <p className="text-ink-soft">{computing ? 'Explaining the node…' : 'Choose a node in the tree to see how its value arises.'}</p>;
  const e = explanation;
  const s = e.oneStep;
  return (
    <div className="flex flex-col gap-4 text-body" aria-live="polite">
      <div>
        <p className="text-caption uppercase tracking-wide text-ink-muted">
          Step {e.step}, node {e.node} · year {e.t.toFixed(3)} · {modeLabel(e.mode)}
        </p>
        <p className="figures mt-1">
          Project value V = <strong>{n4(e.underlying)}</strong>; value with flexibility W = <strong>{n4(e.value)}</strong>
        </p>
      </div>
      {s ? (
        <>
          <section>
            <h4 className="font-semibold">1 · Risk-neutral expectation</h4>
            <p className="figures mt-1 text-ink-soft">
              One step on: up to V = {n4(s.up.underlying)} where W = {n4(s.up.value)}, or down to V = {n4(s.down.underlying)} where W = {n4(s.down.value)}.
            </p>
            <p className="figures mt-1">
              e<sup>−rΔt</sup>[p·W<sub>u</sub> + (1−p)·W<sub>d</sub>] = {s.discount.toFixed(6)} × [{s.p.toFixed(5)} × {n4(s.up.value)} + {(1 - s.p).toFixed(5)}{' '}
              × {n4(s.down.value)}] = <strong>{n4(s.expectation)}</strong>
            </p>
          </section>
          <section>
            <h4 className="font-semibold">2 · Replicating position</h4>
            <p className="figures mt-1">
              Hold Δ = (W<sub>u</sub> − W<sub>d</sub>)/(V<sub>u</sub> − V<sub>d</sub>) = <strong>{n4(s.delta)}</strong> units of the project&rsquo;s value and B
              = <strong>{n4(s.bond)}</strong> in risk-free debt. It pays W<sub>u</sub> or W<sub>d</sub> one step on, and costs Δ·(V − payout) + B ={' '}
              <strong>{n4(s.replicatingCost)}</strong> now.
            </p>
            {Math.abs(s.replicatingCost - s.expectation) > 1e-6 * Math.max(1, Math.abs(s.expectation)) ? (
              <p className="mt-1 text-caption text-ember-700">
                Differs from the expectation by {formatNumber(s.replicatingCost - s.expectation, 6)}: this tree&rsquo;s p is not exactly risk-neutral for its
                own moves (a known property of the parameterisation).
              </p>
            ) : (
              <p className="mt-1 text-caption text-moss-700">Equal to the expectation, as no-arbitrage requires.</p>
            )}
          </section>
        </>
      ) : (
        <p className="text-ink-soft">At the horizon: the value is the mode&rsquo;s value for good, with no step on.</p>
      )}
      <section>
        <h4 className="font-semibold">3 · The decision here</h4>
        <p className="figures mt-1">
          Continuing is worth {n4(e.continuation)} (cash received at the node {n4(e.cashAtNode)} plus the expectation).
        </p>
        {e.alternatives.length === 0 ? (
          <p className="mt-1 text-ink-soft">No right is open at this node.</p>
        ) : (
          <ul className="figures mt-1 list-disc pl-5">
            {e.alternatives.map((a) => (
              <li key={a.right + a.to}>
                {a.right} (to {modeLabel(a.to)}): worth {n4(a.worth)} after its cost{' '}
                {a === e.decision || (e.decision && a.right === e.decision.right && a.to === e.decision.to) ? '— taken' : ''}
              </li>
            ))}
          </ul>
        )}
        <p className="mt-1 font-medium">
          {e.decision ? `Decision: ${e.decision.right}, worth ${n4(e.decision.worth)}.` : 'Decision: continue (ties go to continuing).'}
        </p>
      </section>
    </div>
  );
}
