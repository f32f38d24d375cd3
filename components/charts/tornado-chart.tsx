'use client';

import { SCREEN_LABEL_CHAR } from '@/lib/charts/axis';
import { layoutTornado } from '@/lib/charts/tornado';
import { wrapLabel } from '@/lib/charts/wrap-label';
import { formatMoney, formatPercent } from '@/lib/format';
import type { Sensitivity } from '@/lattice';
import { useWidth } from './use-width';
import { palette } from '@/lib/palette';

/** How an input's move reads for people: money for V0, percentages for rates, ±10 % for costs. */
export function describeBump(s: Sensitivity, side: 'low' | 'high'): string {
  const input = s[side].input;
  if (s.parameter === 'underlying.value') return formatMoney(input);
  if (['underlying.volatility', 'riskFreeRate', 'underlying.payoutYield'].includes(s.parameter)) return formatPercent(input);
  return `${input >= 1 ? '+' : '−'}${Math.round(Math.abs(input - 1) * 100)} %`;
}

/** The caption text size in pixels (tailwind.config.ts: 0.75rem), for wrapping labels. */
const CAPTION_PX = 12;

/** Expanded NPV when each input moves down (left label) and up (right label); the widest swing is on top. */
export function TornadoChart({ sensitivities, base, currency }: { sensitivities: Sensitivity[]; base: number; currency: string }) {
  const { ref, width } = useWidth<HTMLDivElement>();
  // Below 480 px (a phone) each label goes above its bar, across the chart, each row as tall as
  // its own label; wider, in a column left of the bars, every row as tall as the longest label.
  // Either way wrapped to fit, in full.
  const above = width < 480;
  const labelWidth = Math.min(240, width * 0.35);
  const labels = new Map(
    sensitivities.map((x) => [
      x.parameter,
      wrapLabel(`${x.label} (${describeBump(x, 'low')} / ${describeBump(x, 'high')})`, above ? width - 24 : labelWidth - 14, CAPTION_PX, 4),
    ]),
  );
  const lines = Math.max(1, ...[...labels.values()].map((l) => l.length));
  const layout = layoutTornado(sensitivities, base, width, {
    labelWidth,
    // Above, the right margin only holds the last tick's overhang.
    ...(above ? { labelSpace: (s: Sensitivity) => (labels.get(s.parameter)?.length ?? 1) * 15, rightWidth: 24 } : { rowHeight: Math.max(34, lines * 15 + 8) }),
    tickCharWidth: SCREEN_LABEL_CHAR,
  });
  return (
    <div ref={ref} className="w-full">
      <svg width={layout.width} height={layout.height} role="img" aria-label={`Sensitivity of expanded NPV (${currency}); base ${formatMoney(base)}`}>
        {layout.ticks.map((t) => (
          <g key={t.value}>
            <line x1={t.x} x2={t.x} y1={layout.margin.top} y2={layout.height - layout.margin.bottom} stroke={palette.paper.sunk} />
            <text x={t.x} y={layout.height - layout.margin.bottom + 16} textAnchor="middle" className="figures fill-ink-muted text-caption">
              {t.label}
            </text>
          </g>
        ))}
        {/* The base line runs the chart's height, drawn again over each bar; with labels above
            the bars (a phone) only across the bars, so it does not strike through the labels. */}
        {above ? null : (
          <line
            x1={layout.baseX}
            x2={layout.baseX}
            y1={layout.margin.top - 4}
            y2={layout.height - layout.margin.bottom}
            stroke={palette.ink.DEFAULT}
            strokeWidth="1.5"
          />
        )}
        {layout.rows.map((r) => {
          const bar = (x: number | null, side: 'low' | 'high') =>
            x === null ? null : (
              <g>
                <rect
                  x={Math.min(x, layout.baseX)}
                  y={r.y}
                  width={Math.max(1, Math.abs(x - layout.baseX))}
                  height={r.bandHeight}
                  fill={side === 'low' ? palette.line.strong : palette.tide[500]}
                  rx="2"
                />
              </g>
            );
          return (
            <g key={r.sensitivity.parameter}>
              <text
                x={above ? layout.margin.left : layout.margin.left - 10}
                y={r.labelY}
                textAnchor={above ? 'start' : 'end'}
                className="fill-ink text-caption"
              >
                {labels.get(r.sensitivity.parameter)!.map((line, k, lines) => (
                  <tspan
                    key={k}
                    x={above ? layout.margin.left : layout.margin.left - 10}
                    dy={k === 0 ? (above ? '0.35em' : `${0.35 - (lines.length - 1) * 0.6}em`) : '1.2em'}
                  >
                    {line}
                  </tspan>
                ))}
              </text>
              {bar(r.lowX, 'low')}
              {bar(r.highX, 'high')}
              <line x1={layout.baseX} x2={layout.baseX} y1={r.y - 4} y2={r.y + r.bandHeight + 4} stroke={palette.ink.DEFAULT} strokeWidth="1.5" />
              <title>{`${r.sensitivity.label}: ${formatMoney(r.sensitivity.low.expandedNpv, currency)} when ${describeBump(r.sensitivity, 'low')}, ${formatMoney(r.sensitivity.high.expandedNpv, currency)} when ${describeBump(r.sensitivity, 'high')}`}</title>
            </g>
          );
        })}
      </svg>
      <p className="mt-1 flex flex-wrap gap-4 text-caption text-ink-soft">
        <span className="inline-flex items-center gap-1.5">
          <span aria-hidden className="inline-block h-3 w-5 rounded-sm bg-line-strong" /> input moved down (first figure in brackets)
        </span>
        <span className="inline-flex items-center gap-1.5">
          <span aria-hidden className="inline-block h-3 w-5 rounded-sm bg-tide-500" /> input moved up (second figure)
        </span>
        <span>Vertical line: the expanded NPV as valued, {formatMoney(base, currency)}.</span>
      </p>
    </div>
  );
}
