'use client';

import { area, line, scaleLinear } from 'd3';
import type { RightResult } from '@/lattice';
import { decisionRule } from '@/lib/decision-rules';
import { formatMoney } from '@/lib/format';
import { useWidth } from './use-width';
import { palette, seriesStrong } from '@/lib/palette';
import { axisTicks, SCREEN_LABEL_CHAR } from '@/lib/charts/axis';

const dashes = ['', '6 3', '2 3', '8 3 2 3', '1 2', '10 4'];

/**
 * The exercise boundary over time: for each right and each decision its first use leads to, the
 * critical project value at each step where it is taken, on the side the engine reports
 * (lib/decision-rules.ts). Lines differ by dash as well as colour, and are named in the legend.
 * Following a case, it also shades each right's region (the side where it is used) and draws
 * the observed values over time.
 */
export function BoundaryChart({
  rights,
  v0,
  horizon,
  currency,
  observed,
  v0Label = 'V₀ today',
}: {
  rights: RightResult[];
  v0: number;
  horizon: number;
  currency: string;
  /** Observed project values, in years after the valuation date. */
  observed?: { t: number; v: number }[];
  v0Label?: string;
}) {
  const { ref, width } = useWidth<HTMLDivElement>();
  const height = 280;
  const margin = { top: 16, right: 24, bottom: 36, left: 64 };
  // One line per decision: each right's first use, then the decisions it leads to (a stage
  // right's later payments, a mothball right's restart), each with its own colour and dash.
  const series = rights
    .flatMap((s) => {
      const rule = decisionRule(s, currency);
      return [rule, ...rule.followUps].map((reading, n) => ({ key: `${s.id}-${n}`, primary: n === 0, rule: reading }));
    })
    .map((x, k) => ({ ...x, k, points: x.rule.points.map((p) => ({ t: p.t, v: p.threshold })) }));
  const values = series
    .flatMap((x) => x.points.map((p) => p.v))
    .concat(v0)
    .concat((observed ?? []).map((o) => o.v));
  const x = scaleLinear()
    .domain([0, horizon])
    .range([margin.left, width - margin.right]);
  const y = scaleLinear()
    .domain([0, Math.max(...values) * 1.1])
    .nice()
    .range([height - margin.bottom, margin.top]);
  const path = line<{ t: number; v: number }>()
    .x((p) => x(p.t))
    .y((p) => y(p.v));
  return (
    <div ref={ref} className="w-full">
      <svg width={width} height={height} role="img" aria-label={series.map((x) => x.rule.text).join(' ')}>
        {axisTicks(y, 5).map((t) => (
          <g key={t.value}>
            <line x1={margin.left} x2={width - margin.right} y1={t.at} y2={t.at} stroke={palette.paper.sunk} />
            <text x={margin.left - 8} y={t.at} dy="0.35em" textAnchor="end" className="figures fill-ink-muted text-caption">
              {t.label}
            </text>
          </g>
        ))}
        {axisTicks(x, Math.min(10, horizon), { charWidth: SCREEN_LABEL_CHAR }).map((t) => (
          <text key={t.value} x={t.at} y={height - margin.bottom + 16} textAnchor="middle" className="figures fill-ink-muted text-caption">
            {t.label}
          </text>
        ))}
        <text x={(margin.left + width - margin.right) / 2} y={height - 4} textAnchor="middle" className="fill-ink-muted text-caption">
          years
        </text>
        <line x1={margin.left} x2={width - margin.right} y1={y(v0)} y2={y(v0)} stroke={palette.ink.muted} strokeDasharray="3 3" />
        {/* Observations start at the left, from the approval: their line struck through the label there. */}
        <text
          x={observed ? width - margin.right - 4 : margin.left + 4}
          y={y(v0) - 4}
          textAnchor={observed ? 'end' : 'start'}
          className="fill-ink-muted text-caption"
        >
          {v0Label} {formatMoney(v0)}
        </text>
        {observed
          ? series.map(({ key, primary, k, rule, points }) =>
              primary && points.length > 1 && (rule.side === 'above' || rule.side === 'below') ? (
                <path
                  key={`${key}-region`}
                  d={
                    area<{ t: number; v: number }>()
                      .x((p) => x(p.t))
                      .y0((p) => y(p.v))
                      .y1(rule.side === 'above' ? margin.top : height - margin.bottom)(points) ?? ''
                  }
                  fill={seriesStrong[k % seriesStrong.length]}
                  opacity={0.08}
                />
              ) : null,
            )
          : null}
        {observed && observed.length > 0 ? (
          <g>
            <path d={path(observed) ?? ''} fill="none" stroke={palette.ink.DEFAULT} strokeWidth="1.5" />
            {observed.map((o, k) => (
              <circle key={k} cx={x(o.t)} cy={y(o.v)} r="4" fill={palette.ink.DEFAULT} />
            ))}
          </g>
        ) : null}
        {series.map(({ key, k, points }) => (
          <g key={key}>
            {points.length > 1 ? (
              <path
                d={path(points) ?? ''}
                fill="none"
                stroke={seriesStrong[k % seriesStrong.length]}
                strokeWidth="2"
                strokeDasharray={dashes[k % dashes.length]}
              />
            ) : null}
            {/* A right open at a single date has a point, not a line. */}
            {points.length < 3 ? points.map((p) => <circle key={p.t} cx={x(p.t)} cy={y(p.v)} r="4" fill={seriesStrong[k % seriesStrong.length]} />) : null}
          </g>
        ))}
      </svg>
      <ul className="mt-2 flex flex-col gap-1 text-caption text-ink-soft">
        {observed && observed.length > 0 ? (
          <li className="flex items-start gap-2">
            <svg width="28" height="10" aria-hidden className="mt-1 shrink-0">
              <circle cx="14" cy="5" r="4" fill={palette.ink.DEFAULT} />
            </svg>
            The project value as observed; each right&rsquo;s shaded side is where it is used.
          </li>
        ) : null}
        {series.map(({ key, k, rule }) => (
          <li key={key} className="flex items-start gap-2">
            <svg width="28" height="10" aria-hidden className="mt-1 shrink-0">
              <line x1="0" x2="28" y1="5" y2="5" stroke={seriesStrong[k % seriesStrong.length]} strokeWidth="2" strokeDasharray={dashes[k % dashes.length]} />
            </svg>
            {rule.text}
          </li>
        ))}
      </ul>
    </div>
  );
}
