'use client';

import { useState } from 'react';
import { BoundaryChart } from '@/components/charts/boundary-chart';
import { DecisionMap } from '@/components/charts/decision-map';
import { LoadingBlock } from '@/components/load-state';
import { Button } from '@/components/ui/button';
import { Select } from '@/components/ui/select';
import { NODE_BUDGET, type ProjectModel, type ValuationResult } from '@/lattice';
import { firstUse, levelOf, type LatticeWindow } from '@/lib/charts/lattice-window';
import { modeLabel } from '@/lib/mode-words';
import { useNodeExplanation, useValuation } from '@/lib/engine/use-engine';
import { LatticeTree } from './lattice-tree';
import { NodeInspector } from './node-inspector';
import { seriesFill, seriesStrong } from '@/lib/palette';

/** Most steps one window shows: beyond that the node text would be too small to read. */
const MAX_WINDOW_STEPS = 8;
/** Levels each side of the band's centre: seven nodes a column, legible without zooming out. */
const HALF_BAND = 6;

/** The most steps whose whole node grid stays within the engine's budget, for `modes` modes. */
function stepsWithinBudget(modes: number): number {
  let k = 0;
  while (((k + 2) * (k + 3) * modes) / 2 <= NODE_BUDGET) k++;
  return k;
}

interface Props {
  model: ProjectModel;
  modes: string[];
  startMode: string;
  result: ValuationResult | null;
  currency: string;
}

/**
 * The lattice itself: any window of it as a tree with a node inspector — moved by step and by
 * value band, or jumped to the first node where a right is used — and for the whole horizon the
 * exercise boundaries and (when the lattice is small enough to send whole) the decision map of a
 * mode.
 */
export function LatticeSection({ model, modes, startMode, result, currency }: Props) {
  const [mode, setMode] = useState(startMode);
  const [frame, setFrame] = useState<LatticeWindow>({ from: 0, steps: Math.min(model.steps, 4), centre: 0, halfBand: HALF_BAND });
  const [selected, setSelected] = useState<{ step: number; node: number } | null>({ step: 0, node: 0 });
  const [jumpNote, setJumpNote] = useState<string | null>(null);
  const activeMode = modes.includes(mode) ? mode : startMode;
  const fullCells = ((model.steps + 1) * (model.steps + 2) * modes.length) / 2;
  const whole = fullCells <= NODE_BUDGET;
  // The grid the windows are cut from: the whole lattice, or as many steps as the budget allows.
  const gridSteps = whole ? model.steps : stepsWithinBudget(modes.length);
  const lattice = useValuation(model, { extras: false, grid: whole ? true : { steps: gridSteps } });
  const explanation = useNodeExplanation(model, selected ? { ...selected, mode: activeMode } : null);
  const grid = lattice.result?.grid;
  const order = [...new Set(result?.rights.map((s) => s.id) ?? [])];
  const lastFrom = Math.max(0, gridSteps - frame.steps);
  const view = { ...frame, from: Math.min(frame.from, lastFrom), steps: Math.min(frame.steps, model.steps) };
  const year = (step: number) => ((step * model.horizon) / model.steps).toFixed(2);
  const move = (change: Partial<LatticeWindow>) => {
    setJumpNote(null);
    setFrame({ ...view, ...change });
  };

  const jumpTo = (right: string) => {
    if (!grid) return;
    const found = firstUse(grid, right, activeMode);
    if (!found) {
      setJumpNote(
        whole
          ? `No node of the lattice uses ${right}.`
          : `${right} is not used in the first ${gridSteps} steps, the part of this ${model.steps}-step lattice drawn here; fewer steps would show it.`,
      );
      return;
    }
    setMode(found.mode);
    setFrame({ ...view, from: Math.max(0, Math.min(found.step - 1, lastFrom)), centre: levelOf(found.step, found.node) });
    setSelected({ step: found.step, node: found.node });
    setJumpNote(
      `${right} is first used at step ${found.step} (year ${year(found.step)}), node ${found.node}${found.mode !== activeMode ? `, in mode ${modeLabel(found.mode)}` : ''}: selected below.`,
    );
  };

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
          label="Steps in the window"
          value={String(view.steps)}
          onChange={(e) => move({ steps: Number(e.target.value) })}
          options={Array.from({ length: Math.min(MAX_WINDOW_STEPS, model.steps) }, (_, k) => ({ value: String(k + 1), label: String(k + 1) }))}
          className="w-44"
        />
        <label className="flex flex-col gap-1">
          <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">From step</span>
          <input
            type="number"
            min={0}
            max={lastFrom}
            value={view.from}
            onChange={(e) => {
              const from = Number(e.target.value);
              if (Number.isInteger(from)) move({ from: Math.max(0, Math.min(from, lastFrom)) });
            }}
            className="h-10 w-28 rounded-md border border-line-strong bg-paper-raised px-3 text-right"
          />
        </label>
        <div className="flex flex-wrap gap-1 pb-0.5" role="group" aria-label="Move the window">
          <Button variant="secondary" disabled={view.from === 0} onClick={() => move({ from: Math.max(0, view.from - view.steps) })}>
            ◀ Earlier
          </Button>
          <Button variant="secondary" disabled={view.from >= lastFrom} onClick={() => move({ from: Math.min(lastFrom, view.from + view.steps) })}>
            Later ▶
          </Button>
          <Button variant="secondary" onClick={() => move({ centre: view.centre - 2 })}>
            ▲ Higher values
          </Button>
          <Button variant="secondary" onClick={() => move({ centre: view.centre + 2 })}>
            ▼ Lower values
          </Button>
        </div>
      </div>
      {order.length > 0 ? (
        <div className="flex flex-wrap items-center gap-2" role="group" aria-label="Jump to where a right is first used">
          <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">Jump to the first use of</span>
          {order.map((right) => (
            <Button key={right} variant="secondary" disabled={!grid} onClick={() => jumpTo(right)}>
              {right}
            </Button>
          ))}
        </div>
      ) : null}
      <p className="-mt-3 max-w-3xl text-caption text-ink-muted" aria-live="polite">
        {jumpNote ? `${jumpNote} ` : ''}Steps {view.from} to {Math.min(view.from + view.steps, model.steps)} of {model.steps} (years {year(view.from)} to{' '}
        {year(Math.min(view.from + view.steps, model.steps))}). V: the project&rsquo;s value; W: its value in this mode with every right. Nodes are coloured and
        labelled by the decision taken.
      </p>
      <div className="grid grid-cols-[minmax(0,1fr)] gap-6 xl:grid-cols-[minmax(0,1fr)_24rem]">
        <section aria-label="Lattice tree">
          {grid ? (
            <LatticeTree grid={grid} mode={activeMode} frame={view} selected={selected} onSelect={setSelected} decisionOrder={order} />
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
                  style={{ background: seriesFill[k % seriesFill.length] }}
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
      {result && result.rights.length > 0 ? (
        <section className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
          <h3 className="text-body font-semibold">Exercise boundary over time</h3>
          <p className="mb-3 text-caption text-ink-muted">The critical project value at each step where a right is used, over the whole horizon.</p>
          <BoundaryChart rights={result.rights} v0={model.underlying.value} horizon={model.horizon} currency={currency} />
        </section>
      ) : null}
      <section className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
        <h3 className="text-body font-semibold">Decision map: {activeMode}</h3>
        {whole && grid && lattice.result ? (
          <>
            <p className="mb-3 text-caption text-ink-muted">
              The nodes of the lattice by time and project value, filled by the decision taken in this mode: all but the least likely (together under 1 in
              5,000, risk-neutral), with the value axis fitted to the years up to the last node where a right is used (the whole horizon if none is used after
              today).
            </p>
            <DecisionMap grid={grid} p={lattice.result.tree.p} mode={activeMode} fills={seriesStrong} order={order} />
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
