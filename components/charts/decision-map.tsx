'use client';

import { scaleLinear, scaleLog } from 'd3';
import type { NodeGrid } from '@/lattice';
import { useWidth } from './use-width';
import { palette } from '@/lib/palette';
import { axisTicks, logAxisTicks, SCREEN_LABEL_CHAR } from '@/lib/charts/axis';

/**
 * The decision map of one mode over the whole lattice: every node placed by time and project
 * value (log scale), filled by the decision taken there. Reads as regions: where to continue,
 * where each right is used. The legend names each fill.
 */
export function DecisionMap({ grid, mode, fills, order }: { grid: NodeGrid; mode: string; fills: string[]; order: string[] }) {
  const { ref, width } = useWidth<HTMLDivElement>();
  const height = 300;
  const margin = { top: 12, right: 16, bottom: 36, left: 64 };
  // The long axis caption is about 280 px wide, centred on the plot: below 340 px it would run off
  // the right edge, so a shorter one is centred on the whole width.
  const narrow = width < 340;
  const last = grid.steps.at(-1)!;
  const lo = Math.min(...grid.steps.map((s) => s.underlying[0]!));
  const hi = Math.max(...grid.steps.map((s) => s.underlying.at(-1)!));
  const x = scaleLinear()
    .domain([0, last.t || 1])
    .range([margin.left, width - margin.right]);
  const y = scaleLog()
    .domain([lo, hi])
    .range([height - margin.bottom, margin.top]);
  const cellWidth = Math.max(1.5, (width - margin.left - margin.right) / grid.steps.length);
  const cellHeight = Math.max(1.5, (height - margin.top - margin.bottom) / Math.max(1, grid.steps.length));
  const fillOf = (d: string | null) => (d === null ? palette.paper.DEFAULT : fills[order.indexOf(d) % fills.length]!);
  const seen = new Set<string>();
  for (const s of grid.steps) for (const d of s.modes[mode]?.decision ?? []) if (d) seen.add(d);
  return (
    <div ref={ref} className="w-full">
      <svg
        width={width}
        height={height}
        role="img"
        aria-label={`Decision map for mode ${mode}: ${seen.size === 0 ? 'continue everywhere' : [...seen].join(', ')}`}
      >
        {grid.steps.map((s, i) =>
          s.underlying.map((v, j) => {
            const d = s.modes[mode]?.decision[j] ?? null;
            return (
              <rect
                key={`${i}:${j}`}
                x={x(s.t) - cellWidth / 2}
                y={y(v) - cellHeight / 2}
                width={cellWidth}
                height={cellHeight}
                fill={fillOf(d)}
                stroke={d ? 'none' : palette.line.DEFAULT}
                strokeWidth="0.3"
              />
            );
          }),
        )}
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
