'use client';

import { extent, line, max, scaleLinear, scaleUtc } from 'd3';
import { formatPercent } from '@/lib/format';
import { useWidth } from './use-width';
import { palette } from '@/lib/palette';
import { axisTicks } from '@/lib/charts/axis';

interface Point {
  date: string;
  value: number;
}

const toDate = (s: string) => new Date(`${s}T00:00:00Z`);

/** The uploaded series (a line) and its log returns (bars around zero), on one time axis. */
export function HistoryCharts({ series, returns }: { series: Point[]; returns: Point[] }) {
  const { ref, width } = useWidth<HTMLDivElement>();
  const margin = { top: 12, right: 16, bottom: 28, left: 56 };
  const height = 170;
  const [from, to] = extent(series, (p) => toDate(p.date)) as [Date, Date];
  const x = scaleUtc()
    .domain([from, to])
    .range([margin.left, width - margin.right]);
  const [lo, hi] = extent(series, (p) => p.value) as [number, number];
  const y = scaleLinear()
    .domain([lo, hi])
    .nice()
    .range([height - margin.bottom, margin.top]);
  const path = line<Point>()
    .x((p) => x(toDate(p.date)))
    .y((p) => y(p.value))(series);
  const r = max(returns, (p) => Math.abs(p.value)) ?? 0.01;
  const yr = scaleLinear()
    .domain([-r, r])
    .nice()
    .range([height - margin.bottom, margin.top]);
  const barWidth = Math.max(1, (width - margin.left - margin.right) / returns.length - 0.5);
  const axis = x.ticks(6);
  return (
    <div ref={ref} className="grid w-full gap-2">
      <svg width={width} height={height} role="img" aria-label={`The series: ${series.length} values from ${series[0]?.date} to ${series.at(-1)?.date}`}>
        {axisTicks(y, 4).map((t) => (
          <g key={t.value}>
            <line x1={margin.left} x2={width - margin.right} y1={t.at} y2={t.at} stroke={palette.paper.sunk} />
            <text x={margin.left - 6} y={t.at} dy="0.35em" textAnchor="end" className="figures fill-ink-muted text-caption">
              {t.label}
            </text>
          </g>
        ))}
        {path ? <path d={path} fill="none" stroke={palette.ink.DEFAULT} strokeWidth="1.3" /> : null}
        {axis.map((t) => (
          <text key={+t} x={x(t)} y={height - 8} textAnchor="middle" className="fill-ink-muted text-caption">
            {t.getUTCFullYear()}-{String(t.getUTCMonth() + 1).padStart(2, '0')}
          </text>
        ))}
      </svg>
      <svg width={width} height={height} role="img" aria-label={`Log returns, between ${formatPercent(-r)} and ${formatPercent(r)}`}>
        {axisTicks(yr, 4, { label: (v, digits) => formatPercent(v, Math.max(0, digits - 2)) }).map((t) => (
          <g key={t.value}>
            <line x1={margin.left} x2={width - margin.right} y1={t.at} y2={t.at} stroke={t.value === 0 ? palette.ink.muted : palette.paper.sunk} />
            <text x={margin.left - 6} y={t.at} dy="0.35em" textAnchor="end" className="figures fill-ink-muted text-caption">
              {t.label}
            </text>
          </g>
        ))}
        {returns.map((p) => (
          <rect
            key={p.date}
            x={x(toDate(p.date)) - barWidth / 2}
            width={barWidth}
            y={Math.min(yr(0), yr(p.value))}
            height={Math.abs(yr(p.value) - yr(0))}
            fill={p.value >= 0 ? palette.tide[500] : palette.ember[500]}
          />
        ))}
      </svg>
      <p className="text-caption text-ink-muted">Top: the values as uploaded (sorted by date). Bottom: their log returns, period by period.</p>
    </div>
  );
}
