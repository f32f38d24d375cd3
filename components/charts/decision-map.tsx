'use client';

import { scaleLinear, scaleLog } from 'd3';
import type { NodeGrid } from '@/lattice';
import { useWidth } from './use-width';
import { palette } from '@/lib/palette';
import { axisTicks, logAxisTicks, SCREEN_LABEL_CHAR } from '@/lib/charts/axis';
import { decisionMapLayout } from '@/lib/charts/decision-map';

/**
 * The decision map of one mode over the whole horizon: the nodes the project is likely to reach
 * placed by time and project value (log scale), filled by the decision taken there. Reads as
 * regions: where to continue, where each right is used. The legend names each fill.
 */
export function DecisionMap({ grid, p, mode, fills, order }: { grid: NodeGrid; p: number; mode: string; fills: string[]; order: string[] }) {
  const { ref, width } = useWidth<HTMLDivElement>();
  const height = 300;
  const margin = { top: 12, right: 16, bottom: 36, left: 64 };
  // The long axis caption is about 280 px wide, centred on the plot: below 340 px it would run off
  // the right edge, so a shorter one is centred on the whole width.
  const narrow = width < 340;
  const last = grid.steps.at(-1)!;
  const { cells, values } = decisionMapLayout(grid, mode, p);
  const x = scaleLinear()
    .domain([0, last.t || 1])
    .range([margin.left, width - margin.right]);
  const y = scaleLog()
    .domain(values)
    .range([height - margin.bottom, margin.top]);
  const plot = { y: margin.top, width: width - margin.left - margin.right, height: height - margin.top - margin.bottom };
  const cellWidth = Math.max(1.5, plot.width / grid.steps.length);
  // Nodes of one step are u/d apart: a cell as tall as that spacing on the log scale meets its
  // neighbours, and the next step's cells sit between them.
  const spread = grid.steps.find((s) => s.underlying.length > 1)?.underlying;
  const cellHeight = Math.max(1.5, spread ? Math.abs(y(spread[0]!) - y(spread[1]!)) : 0);
  const fillOf = (d: string | null) => (d === null ? palette.paper.DEFAULT : fills[order.indexOf(d) % fills.length]!);
  const seen = new Set(cells.flatMap((c) => (c.decision ? [c.decision] : [])));
  const clip = `decision-map-plot-${mode.replace(/[^A-Za-z0-9_-]/g, '_')}`;
  return (
    <div ref={ref} className="w-full">
      <svg
        width={width}
        height={height}
        role="img"
        aria-label={`Decision map for mode ${mode}: ${seen.size === 0 ? 'continue everywhere' : [...seen].join(', ')}`}
      >
        <clipPath id={clip}>
          <rect x={0} y={plot.y - cellHeight} width={width} height={plot.height + 2 * cellHeight} />
        </clipPath>
        <g clipPath={`url(#${clip})`}>
          {cells.map((c, k) => (
            <rect
              key={k}
              x={x(c.t) - cellWidth / 2}
              y={y(c.value) - cellHeight / 2}
              width={cellWidth}
              height={cellHeight}
              fill={fillOf(c.decision)}
              stroke={c.decision ? 'none' : palette.line.DEFAULT}
              strokeWidth="0.3"
            />
          ))}
        </g>
        {logAxisTicks(y, 4).map((t) => (
          <text key={t.value} x={margin.left - 8} y={t.at} dy="0.35em" textAnchor="end" className="figures fill-ink-muted text-caption">
            {t.label}
          </text>
        ))}
        {axisTicks(x, 8, { charWidth: SCREEN_LABEL_CHAR }).map((t) => (
          <text key={t.value} x={t.at} y={height - margin.bottom + 16} textAnchor="middle" className="figures fill-ink-muted text-caption">
            {t.label}
          </text>
        ))}
        <text x={narrow ? width / 2 : (margin.left + width - margin.right) / 2} y={height - 4} textAnchor="middle" className="fill-ink-muted text-caption">
          {narrow ? 'years (vertical: value, log scale)' : 'years (vertical: project value, log scale)'}
        </text>
      </svg>
      <ul className="mt-2 flex flex-wrap gap-4 text-caption text-ink-soft">
        <li className="inline-flex items-center gap-1.5">
          <span aria-hidden className="inline-block h-3 w-4 border border-line bg-paper" /> continue
        </li>
        {[...seen].map((d) => (
          <li key={d} className="inline-flex items-center gap-1.5">
            <span aria-hidden className="inline-block h-3 w-4" style={{ background: fillOf(d) }} /> {d}
          </li>
        ))}
      </ul>
    </div>
  );
}
