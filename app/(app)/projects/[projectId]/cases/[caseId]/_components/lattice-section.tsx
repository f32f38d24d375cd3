'use client';

import { useState } from 'react';
import { BoundaryChart } from '@/components/charts/boundary-chart';
import { DecisionMap } from '@/components/charts/decision-map';
import { LoadingBlock } from '@/components/load-state';
import { Select } from '@/components/ui/select';
import { NODE_BUDGET, type ProjectModel, type ValuationResult } from '@/lattice';
import { modeLabel } from '@/lib/mode-words';
import { useNodeExplanation, useValuation } from '@/lib/engine/use-engine';
import { decisionFills, LatticeTree } from './lattice-tree';
import { NodeInspector } from './node-inspector';

const strongFills = ['#23727a', '#b9622f', '#3f7a4b', '#ad3f2b', '#5b4a8a', '#8a7a20'];
const MAX_TREE_STEPS = 10;

interface Props {
  model: ProjectModel;
  modes: string[];
  startMode: string;
  result: ValuationResult | null;
  currency: string;
}

/**
 * The lattice itself: its first steps as a tree with a node inspector, and for the whole
 * horizon the exercise boundaries and (when the lattice is small enough to send whole) the
 * decision map of a mode.
 */
export function LatticeSection({ model, modes, startMode, result, currency }: Props) {
  const [mode, setMode] = useState(startMode);
  const [shown, setShown] = useState(Math.min(model.steps, 6));
  const [selected, setSelected] = useState<{ step: number; node: number } | null>({ step: 0, node: 0 });
  const activeMode = modes.includes(mode) ? mode : startMode;
  const fullCells = ((model.steps + 1) * (model.steps + 2) * modes.length) / 2;
  const whole = fullCells <= NODE_BUDGET;
  const lattice = useValuation(model, { extras: false, grid: whole ? true : { steps: MAX_TREE_STEPS } });
  const explanation = useNodeExplanation(model, selected ? { ...selected, mode: activeMode } : null);
  const grid = lattice.result?.grid;
  const order = [...new Set(result?.switches.map((s) => s.id) ?? [])];
  const treeSteps = Math.min(shown, model.steps);

  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-end gap-4">
        <Select
          label="Mode shown"
          value={activeMode}
          onChange={(e) => setMode(e.target.value)}
          options={modes.map((m) => ({ value: m, label: m === startMode ? `${modeLabel(m)} (today)` : modeLabel(m) }))}
          className="w-72"
        />
        <Select
          label="Steps in the tree"
          value={String(treeSteps)}
          onChange={(e) => setShown(Number(e.target.value))}
          options={Array.from({ length: Math.min(MAX_TREE_STEPS, model.steps) }, (_, k) => ({ value: String(k + 1), label: String(k + 1) }))}
          className="w-40"
        />
        <p className="max-w-md pb-1 text-caption text-ink-muted">
          The first {treeSteps} of {model.steps} steps (to year {((treeSteps * model.horizon) / model.steps).toFixed(2)}). V: the project&rsquo;s value; W: its
          value in this mode with every right. Nodes are coloured and labelled by the decision taken.
        </p>
      </div>
      <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_24rem]">
        <section aria-label="Lattice tree">
          {grid ? (
            <LatticeTree grid={grid} mode={activeMode} steps={treeSteps} selected={selected} onSelect={setSelected} decisionOrder={order} />
          ) : lattice.issues ? (
            <p role="alert" className="text-brick-700">
              {lattice.issues[0]?.message}
            </p>
          ) : (
            <LoadingBlock label="Building the lattice" lines={6} />
          )}
          <ul className="mt-2 flex flex-wrap gap-4 text-caption text-ink-soft" aria-label="Legend">
            <li className="inline-flex items-center gap-1.5">
              <span aria-hidden className="inline-block h-3 w-4 rounded-sm border border-line-strong bg-white" /> continue
            </li>
            {order.map((d, k) => (
              <li key={d} className="inline-flex items-center gap-1.5">
                <span
                  aria-hidden
                  className="inline-block h-3 w-4 rounded-sm border border-line-strong"
                  style={{ background: decisionFills[k % decisionFills.length] }}
                />{' '}
                ▶ {d}
              </li>
            ))}
          </ul>
        </section>
        <section aria-labelledby="inspector-heading" className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
          <h3 id="inspector-heading" className="mb-3 text-body font-semibold">
            Node inspector
          </h3>
          <NodeInspector explanation={explanation.result} issues={explanation.issues} computing={explanation.computing} />
        </section>
      </div>
      {result && result.switches.length > 0 ? (
        <section className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
          <h3 className="text-body font-semibold">Exercise boundary over time</h3>
          <p className="mb-3 text-caption text-ink-muted">The critical project value at each step where a right is used, over the whole horizon.</p>
          <BoundaryChart switches={result.switches} v0={model.underlying.value} horizon={model.horizon} currency={currency} />
        </section>
      ) : null}
      <section className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
        <h3 className="text-body font-semibold">Decision map: {activeMode}</h3>
        {whole && grid ? (
          <>
            <p className="mb-3 text-caption text-ink-muted">Every node of the lattice by time and project value, filled by the decision taken in this mode.</p>
            <DecisionMap grid={grid} mode={activeMode} fills={strongFills} order={order} />
          </>
        ) : (
          <p className="text-caption text-ink-muted">
            The whole lattice ({fullCells.toLocaleString('en-GB')} node-mode cells) is over the {NODE_BUDGET.toLocaleString('en-GB')} the page draws; the
            boundary chart above covers every step. Fewer steps bring the map back.
          </p>
        )}
      </section>
    </div>
  );
}
