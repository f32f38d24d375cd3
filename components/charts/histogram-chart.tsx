'use client';

import { scaleLinear } from 'd3';
import { formatPercent } from '@/lib/format';
import { useWidth } from './use-width';
import { palette } from '@/lib/palette';
import { axisTicks, SCREEN_LABEL_CHAR } from '@/lib/charts/axis';

/** A histogram of simulated returns (bins of z = ln of the year-1 value over today's), in counts of paths. */
export function HistogramChart({ bins, label }: { bins: { from: number; to: number; count: number }[]; label: string }) {
  const { ref, width } = useWidth<HTMLDivElement>(360);
  if (bins.length === 0) return <p className="text-caption text-ink-muted">No path had a positive value at year 1.</p>;
  const height = 150;
  const margin = { top: 8, right: 8, bottom: 24, left: 8 };
  const x = scaleLinear()
    .domain([bins[0]!.from, bins.at(-1)!.to])
    .range([margin.left, width - margin.right]);
  const y = scaleLinear()
    .domain([0, Math.max(...bins.map((b) => b.count))])
    .range([height - margin.bottom, margin.top]);
  return (
    <div ref={ref} className="w-full">
      <svg width={width} height={height} role="img" aria-label={label}>
        {bins.map((b) => (
          <rect key={b.from} x={x(b.from)} width={Math.max(1, x(b.to) - x(b.from) - 1)} y={y(b.count)} height={y(0) - y(b.count)} fill={palette.tide[500]} />
        ))}
        {axisTicks(x, 5, { label: (v, digits) => formatPercent(v, Math.max(0, digits - 2)), charWidth: SCREEN_LABEL_CHAR }).map((t) => (
          <text key={t.value} x={t.at} y={height - 6} textAnchor="middle" className="figures fill-ink-muted text-caption">
            {t.label}
          </text>
        ))}
      </svg>
    </div>
  );
}
