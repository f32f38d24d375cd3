'use client';

import { select, zoom, zoomIdentity, type ZoomBehavior } from 'd3';
import { useEffect, useRef } from 'react';
import type { NodeGrid } from '@/lattice';
import { NODE_HEIGHT, NODE_WIDTH } from '@/lib/charts/lattice-tree';
import { layoutLatticeWindow, type LatticeWindow } from '@/lib/charts/lattice-window';
import { formatNumber } from '@/lib/format';
import { palette, seriesFill } from '@/lib/palette';

interface Props {
  grid: NodeGrid;
  mode: string;
  frame: LatticeWindow;
  selected: { step: number; node: number } | null;
  onSelect: (ref: { step: number; node: number }) => void;
  decisionOrder: string[];
}

/** A node's decision as it fits the node: a long name cut at 14 characters. */
const shownDecision = (decision: string | null) => (decision ? `▶ ${decision.length > 15 ? `${decision.slice(0, 14)}…` : decision}` : 'continue');

/**
 * A window onto the lattice as a tree (lib/charts/lattice-window.ts): each node shows the
 * project's value (V) and the mode's value with flexibility (W), and names the decision taken
 * there. Drag to pan, scroll or pinch to zoom; nodes are buttons (Tab, Enter) that open the
 * inspector.
 */
export function LatticeTree({ grid, mode, frame, selected, onSelect, decisionOrder }: Props) {
  const svgRef = useRef<SVGSVGElement>(null);
  const layerRef = useRef<SVGGElement>(null);
  const zoomRef = useRef<ZoomBehavior<SVGSVGElement, unknown> | null>(null);
  const layout = layoutLatticeWindow(grid, mode, frame);
  const viewHeight = Math.min(560, Math.max(260, layout.height));

  useEffect(() => {
    const element = svgRef.current;
    if (!element || !layerRef.current) return;
    const layer = select(layerRef.current);
    let touched = false;
    const behaviour = zoom<SVGSVGElement, unknown>()
      .scaleExtent([0.3, 3])
      .on('zoom', (event) => {
        if (event.sourceEvent) touched = true;
        layer.attr('transform', event.transform.toString());
      });
    zoomRef.current = behaviour;
    const svg = select(element).call(behaviour);
    // Fit the tree to the box, again whenever the box changes size (e.g. its tab is shown),
    // until the user pans or zooms themselves.
    const fit = () => {
      if (touched || element.clientWidth === 0) return;
      const k = Math.min(1, element.clientWidth / layout.width, viewHeight / layout.height);
      svg.call(behaviour.transform, zoomIdentity.translate((element.clientWidth - layout.width * k) / 2, (viewHeight - layout.height * k) / 2).scale(k));
    };
    fit();
    const observer = new ResizeObserver(fit);
    observer.observe(element);
    return () => {
      observer.disconnect();
      svg.on('.zoom', null);
    };
    // A new window is fitted afresh.
  }, [layout.width, layout.height, viewHeight, frame.from, frame.steps, frame.centre]);

  const zoomBy = (k: number) => svgRef.current && zoomRef.current && select(svgRef.current).call(zoomRef.current.scaleBy, k);
  const fillOf = (decision: string | null) => (decision === null ? palette.paper.raised : seriesFill[decisionOrder.indexOf(decision) % seriesFill.length]);

  return (
    <div className="relative rounded-card border border-line bg-paper-raised">
      <div className="absolute right-2 top-2 z-10 flex gap-1">
        <button type="button" onClick={() => zoomBy(1.25)} className="h-8 w-8 rounded border border-line-strong bg-paper-raised" aria-label="Zoom in">
          +
        </button>
        <button type="button" onClick={() => zoomBy(0.8)} className="h-8 w-8 rounded border border-line-strong bg-paper-raised" aria-label="Zoom out">
          −
        </button>
      </div>
      <svg
        ref={svgRef}
        width="100%"
        height={viewHeight}
        className="cursor-grab touch-none active:cursor-grabbing"
        role="group"
        aria-label={`Lattice, steps ${frame.from} to ${frame.from + frame.steps}, mode ${mode}`}
      >
        <g ref={layerRef}>
          {layout.edges.map((e) => (
            <line
              key={`${e.from.step}:${e.from.node}-${e.to.node}`}
              x1={e.from.x + NODE_WIDTH}
              y1={e.from.y}
              x2={e.to.x}
              y2={e.to.y}
              stroke={palette.line.strong}
            />
          ))}
          {layout.nodes.map((n) => {
            const isSelected = selected?.step === n.step && selected.node === n.node;
            // Each figure and the decision are written once: the node shows them and its name repeats them.
            const underlying = formatNumber(n.underlying);
            const value = formatNumber(n.value);
            const shown = shownDecision(n.decision);
            return (
              <g
                key={`${n.step}:${n.node}`}
                transform={`translate(${n.x},${n.y - NODE_HEIGHT / 2})`}
                role="button"
                tabIndex={0}
                aria-pressed={isSelected}
                // What the node shows comes first, in its words (so a voice command naming it finds it), then
                // what it means. The texts end in a space so that, read together, they are those words.
                aria-label={`V ${underlying} W ${value} ${shown}: step ${n.step}, node ${n.node}, project value ${underlying}, value with flexibility ${value}${n.decision ? `, decision: ${n.decision}` : ''}`}
                onClick={() => onSelect({ step: n.step, node: n.node })}
                onKeyDown={(e) => {
                  if (e.key === 'Enter' || e.key === ' ') {
                    e.preventDefault();
                    onSelect({ step: n.step, node: n.node });
                  }
                }}
                className="cursor-pointer outline-none [&:focus-visible>rect]:stroke-tide-500 [&:focus-visible>rect]:stroke-[3]"
              >
                <rect
                  width={NODE_WIDTH}
                  height={NODE_HEIGHT}
                  rx="6"
                  fill={fillOf(n.decision)}
                  stroke={isSelected ? palette.ink.DEFAULT : palette.line.strong}
                  strokeWidth={isSelected ? 2.5 : 1}
                />
                <text x="8" y="16" className="figures fill-ink-soft text-[11px]">
                  V {underlying}{' '}
                </text>
                <text x="8" y="31" className="figures fill-ink text-[12px] font-semibold">
                  W {value}{' '}
                </text>
                <text x="8" y="45" className="fill-ink-soft text-[10px]">
                  {shown}
                </text>
              </g>
            );
          })}
        </g>
      </svg>
    </div>
  );
}
