'use client';

import { SCREEN_LABEL_CHAR } from '@/lib/charts/axis';
import { layoutNpvComparison, npvFigures, npvLabelPlacement, type NpvPair } from '@/lib/charts/npv-comparison';
import { textWidth, wrapLabel } from '@/lib/charts/wrap-label';
import { formatMoney } from '@/lib/format';
import { useWidth } from './use-width';
import { palette } from '@/lib/palette';

/**
 * NPV without flexibility (hollow ring) and with it (filled dot), one row per project or case;
 * the bar between them is the option premium. Shapes and the legend carry the meaning, not colour.
 */
export function NpvComparisonChart({ items, currency, title }: { items: NpvPair[]; currency?: string; title: string }) {
  const { ref, width } = useWidth<HTMLDivElement>();
  const { labelWidth, labelsAbove, figuresOwnLine, line } = npvLabelPlacement(items, width);
  const layout = layoutNpvComparison(items, width, { labelWidth, tickCharWidth: SCREEN_LABEL_CHAR, labelsAbove, figuresOwnLine });
  // The grid and the zero line run the chart's height; with labels above the marks, only across
  // each row's marks (and from the last row to the axis), so they do not strike through a name.
  const bottom = layout.height - layout.margin.bottom;
  const spans: [number, number][] = layout.labelsAbove
    ? layout.rows.map((r, k) => [r.y - 12, k === layout.rows.length - 1 ? bottom : r.y + 12])
    : [[layout.margin.top, bottom]];
  return (
    <figure ref={ref} className="w-full">
      <figcaption className="mb-2 flex flex-wrap items-center gap-x-6 gap-y-1 text-caption text-ink-soft">
        <span className="font-semibold uppercase tracking-wide">{title}</span>
        <span className="inline-flex items-center gap-1.5">
          <svg width="12" height="12" aria-hidden>
            <circle cx="6" cy="6" r="4.5" fill="white" stroke={palette.ink.soft} strokeWidth="1.5" />
          </svg>
          Static NPV (no flexibility)
        </span>
        <span className="inline-flex items-center gap-1.5">
          <svg width="12" height="12" aria-hidden>
            <circle cx="6" cy="6" r="5" fill={palette.tide[500]} />
          </svg>
          Expanded NPV (with flexibility)
        </span>
      </figcaption>
      <svg
        width={layout.width}
        height={layout.height}
        role="img"
        aria-label={`${title}: ${items.map((i) => `${i.label} static ${formatMoney(i.staticNpv, currency)}, expanded ${formatMoney(i.expandedNpv, currency)}`).join('; ')}`}
      >
        {layout.ticks.map((t) => (
          <g key={t.value}>
            {spans.map(([top, bottom]) => (
              <line key={top} x1={t.x} x2={t.x} y1={top} y2={bottom} stroke={palette.paper.sunk} />
            ))}
            <text x={t.x} y={layout.height - layout.margin.bottom + 16} textAnchor="middle" className="fill-ink-muted text-caption figures">
              {t.label}
            </text>
          </g>
        ))}
        {spans.map(([top, bottom]) => (
          <line
            key={top}
            x1={layout.zeroX}
            x2={layout.zeroX}
            y1={layout.labelsAbove ? top : top - 4}
            y2={bottom}
            stroke={palette.ink.muted}
            strokeDasharray="3 3"
          />
        ))}
        {layout.rows.map((r) => (
          <g key={r.id}>
            {layout.labelsAbove ? (
              <>
                <text x={layout.margin.left} y={r.labelY} dy="0.35em" className="fill-ink text-body">
                  {wrapLabel(r.label, figuresOwnLine ? line : line - textWidth(npvFigures(r), 12) - 12, 15, 1)[0]}
                </text>
                <text
                  x={figuresOwnLine ? layout.margin.left : layout.width - layout.margin.right}
                  y={r.figuresY}
                  dy="0.35em"
                  textAnchor={figuresOwnLine ? 'start' : 'end'}
                  className="fill-ink-soft text-caption figures"
                >
                  {npvFigures(r)}
                </text>
              </>
            ) : (
              <text x={layout.margin.left - 12} y={r.y} textAnchor="end" className="fill-ink text-body">
                {wrapLabel(r.label, layout.margin.left - 16, 15, 2).map((line, k, lines) => (
                  <tspan key={k} x={layout.margin.left - 12} dy={k === 0 ? `${0.35 - (lines.length - 1) * 0.6}em` : '1.2em'}>
                    {line}
                  </tspan>
                ))}
              </text>
            )}
            <line x1={r.staticX} x2={r.expandedX} y1={r.y} y2={r.y} stroke={palette.tide[300]} strokeWidth="6" strokeLinecap="round" />
            <circle cx={r.staticX} cy={r.y} r="6" fill="white" stroke={palette.ink.soft} strokeWidth="2" />
            <circle cx={r.expandedX} cy={r.y} r="6.5" fill={palette.tide[500]} />
            {layout.labelsAbove ? null : (
              <text x={Math.max(r.staticX, r.expandedX) + 12} y={r.y} dy="0.35em" className="fill-ink-soft text-caption figures">
                {npvFigures(r)}
              </text>
            )}
          </g>
        ))}
      </svg>
    </figure>
  );
}
