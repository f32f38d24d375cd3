'use client';

import { line, scaleLinear } from 'd3';
import type { Convergence } from '@/lattice';
import { formatMoney } from '@/lib/format';
import { useWidth } from './use-width';
import { palette } from '@/lib/palette';
import { axisTicks } from '@/lib/charts/axis';

/** The expanded NPV as steps grow, with the engine's error band around the case's own value and the extrapolated value. */
export function ConvergenceChart({ convergence, currency }: { convergence: Convergence; currency: string }) {
  const { ref, width } = useWidth<HTMLDivElement>(480);
  const height = 200;
  const margin = { top: 16, right: 24, bottom: 36, left: 64 };
  const { extrapolated } = convergence;
  const points = convergence.points.map((p) => ({ steps: p.steps, value: p.expandedNpv }));
  const own = points.at(-1)!.value;
  const band = convergence.band ?? { low: own, high: own };
  const values = points.map((p) => p.value).concat(band.low, band.high, extrapolated);
  const x = scaleLinear()
    .domain([0, Math.max(...points.map((p) => p.steps))])
    .range([margin.left, width - margin.right]);
  const pad = (Math.max(...values) - Math.min(...values)) * 0.15 || Math.abs(extrapolated) * 0.01 || 1;
  const y = scaleLinear()
    .domain([Math.min(...values) - pad, Math.max(...values) + pad])
    .nice()
    .range([height - margin.bottom, margin.top]);
  // As many decimals as the tick spacing needs, so no two ticks read the same.
  const ticks = axisTicks(y, 4);
  const path = line<{ steps: number; value: number }>()
    .x((p) => x(p.steps))
    .y((p) => y(p.value))(points);
  return (
    <div ref={ref} className="w-full">
      <svg
        width={width}
        height={height}
        role="img"
        aria-label={`Expanded NPV at ${points.map((p) => `${p.steps} steps ${formatMoney(p.value, currency)}`).join(', ')}; extrapolated ${formatMoney(extrapolated, currency)}`}
      >
        <rect
          x={margin.left}
          width={width - margin.left - margin.right}
          y={y(band.high)}
          height={Math.max(1, y(band.low) - y(band.high))}
          fill={palette.tide[50]}
        />
        <line x1={margin.left} x2={width - margin.right} y1={y(extrapolated)} y2={y(extrapolated)} stroke={palette.tide[500]} strokeDasharray="4 3" />
        <text x={width - margin.right} y={y(extrapolated) - 6} textAnchor="end" className="fill-tide-700 text-caption">
          extrapolated {formatMoney(extrapolated, currency, 2)}
        </text>
        {ticks.map((t) => (
          <text key={t.value} x={margin.left - 8} y={t.at} dy="0.35em" textAnchor="end" className="figures fill-ink-muted text-caption">
            {t.label}
          </text>
        ))}
        {path ? <path d={path} fill="none" stroke={palette.ink.DEFAULT} strokeWidth="1.5" /> : null}
        {points.map((p) => (
          <g key={p.steps}>
            <circle cx={x(p.steps)} cy={y(p.value)} r="4" fill={palette.ink.DEFAULT} />
            <text x={x(p.steps)} y={height - margin.bottom + 16} textAnchor="middle" className="figures fill-ink-soft text-caption">
              {p.steps}
            </text>
          </g>
        ))}
        <text x={(margin.left + width - margin.right) / 2} y={height - 4} textAnchor="middle" className="fill-ink-muted text-caption">
          lattice steps
        </text>
      </svg>
    </div>
  );
}
