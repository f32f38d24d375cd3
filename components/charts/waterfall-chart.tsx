'use client';

import { layoutWaterfall, waterfallLabels, waterfallSteps } from '@/lib/charts/waterfall';
import { formatChange, formatMoney } from '@/lib/format';
import type { ValuationResult } from '@/lattice';
import { useWidth } from './use-width';
import { palette } from '@/lib/palette';

/** Lines of label under each bar. */
const LABEL_LINES = 4;

/** From static to expanded NPV: each right's stand-alone value and the engine's interaction, signed in text as well as colour. */
export function WaterfallChart({ result, currency }: { result: ValuationResult; currency: string }) {
  const { ref, width } = useWidth<HTMLDivElement>();
  const steps = waterfallSteps(result);
  // Room under the bars for four lines of label: an option's name (at most 64 characters) fits
  // whole where the bars are wide enough.
  const spacious = layoutWaterfall(steps, width, 300 + 28, 16 + LABEL_LINES * 14);
  const labels = waterfallLabels(spacious.bars, 12, LABEL_LINES);
  // Bars marked with numbers need one line under them, not four.
  const layout = labels.key ? layoutWaterfall(steps, width, 300 + 28 - (LABEL_LINES - 1) * 14, 16 + 14) : spacious;
  return (
    <div ref={ref} className="w-full">
      <svg
        width={layout.width}
        height={layout.height}
        role="img"
        aria-label={`Bridge from static to expanded NPV: ${steps.map((s) => `${s.label} ${s.kind === 'total' ? formatMoney(s.value, currency) : formatChange(s.value, currency)}`).join(', ')}`}
      >
        {layout.ticks.map((t) => (
          <g key={t.value}>
            <line x1={layout.margin.left} x2={layout.width - layout.margin.right} y1={t.y} y2={t.y} stroke={palette.paper.sunk} />
            <text x={layout.margin.left - 8} y={t.y} dy="0.35em" textAnchor="end" className="figures fill-ink-muted text-caption">
              {t.label}
            </text>
          </g>
        ))}
        <line x1={layout.margin.left} x2={layout.width - layout.margin.right} y1={layout.zeroY} y2={layout.zeroY} stroke={palette.ink.muted} />
        {layout.bars.map((b, k) => {
          const fill = b.kind === 'total' ? palette.ink.DEFAULT : b.value >= 0 ? palette.tide[500] : palette.brick[500];
          const next = layout.bars[k + 1];
          return (
            <g key={b.key}>
              <rect x={b.x} y={b.y} width={b.width} height={b.height} fill={fill} rx="2" opacity={b.kind === 'total' ? 0.85 : 1} />
              {next ? (
                <line
                  x1={b.x + b.width}
                  x2={next.x}
                  y1={b.to >= b.from ? b.y : b.y + b.height}
                  y2={b.to >= b.from ? b.y : b.y + b.height}
                  stroke={palette.line.strong}
                  strokeDasharray="2 2"
                />
              ) : null}
              <text x={b.center} y={b.y - 6} textAnchor="middle" className="figures fill-ink text-caption font-semibold">
                {b.kind === 'total' ? formatMoney(b.value) : formatChange(b.value)}
              </text>
              <text x={b.center} y={layout.height - layout.margin.bottom + 16} textAnchor="middle" className="fill-ink-soft text-caption">
                {labels.lines[k]!.map((line, n) => (
                  <tspan key={n} x={b.center} dy={n === 0 ? 0 : 14}>
                    {line}
                  </tspan>
                ))}
              </text>
            </g>
          );
        })}
      </svg>
      {labels.key ? (
        <ol aria-hidden="true" className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-caption text-ink-soft">
          {labels.key.map((k) => (
            <li key={k.mark}>
              <span className="figures font-semibold text-ink">{k.mark}</span> {k.label}
            </li>
          ))}
        </ol>
      ) : null}
    </div>
  );
}
