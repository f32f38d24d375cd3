/**
 * Geometry of the bridge from static to expanded NPV: the static NPV, each right's stand-alone
 * value, the engine's interaction (what the rights are worth together beyond the sum of their
 * stand-alone values; negative when they substitute) and the expanded NPV. Pure (d3-scale only), shared by the web and PDF charts.
 */
import { scaleBand, scaleLinear } from 'd3';
import { axisTicks } from './axis';
import { fitsWhole, wrapLabel } from './wrap-label';
import type { ValuationResult } from '@/lattice';

export interface WaterfallStep {
  key: string;
  label: string;
  /** 'total' bars start at 0; 'change' bars float from the running total. */
  kind: 'total' | 'change';
  value: number;
  from: number;
  to: number;
}

export function waterfallSteps(result: Pick<ValuationResult, 'staticNpv' | 'expandedNpv' | 'optionPremium' | 'rights' | 'interaction'>): WaterfallStep[] {
  const steps: WaterfallStep[] = [{ key: 'static', label: 'Static NPV', kind: 'total', value: result.staticNpv, from: 0, to: result.staticNpv }];
  let running = result.staticNpv;
  for (const s of result.rights) {
    if (s.standalone === null) continue;
    steps.push({ key: `right:${s.id}`, label: s.id, kind: 'change', value: s.standalone, from: running, to: running + s.standalone });
    running += s.standalone;
  }
  // The engine's interaction closes the bridge (results stored before it reported one: the remainder).
  const interaction = result.interaction ?? (result.rights.length > 1 ? result.expandedNpv - running : null);
  if (interaction !== null && result.rights.length > 1)
    steps.push({ key: 'interaction', label: 'Together vs. alone', kind: 'change', value: interaction, from: running, to: running + interaction });
  steps.push({ key: 'expanded', label: 'Expanded NPV', kind: 'total', value: result.expandedNpv, from: 0, to: result.expandedNpv });
  return steps;
}

/** The share of each bar's band left empty around it. */
const BAR_PADDING = 0.3;

export interface WaterfallLayout {
  width: number;
  height: number;
  margin: { top: number; right: number; bottom: number; left: number };
  bars: (WaterfallStep & { x: number; width: number; y: number; height: number; center: number })[];
  ticks: { value: number; y: number; label: string }[];
  zeroY: number;
}

/** `labelSpace` is the room under the bars for their labels (several lines in the board pack). */
export function layoutWaterfall(steps: WaterfallStep[], width: number, height = 300, labelSpace = 48): WaterfallLayout {
  const margin = { top: 24, right: 16, bottom: labelSpace, left: 56 };
  const values = steps.flatMap((s) => [s.from, s.to, 0]);
  const y = scaleLinear()
    .domain([Math.min(...values), Math.max(...values)])
    .nice()
    .range([height - margin.bottom, margin.top]);
  const x = scaleBand()
    .domain(steps.map((s) => s.key))
    .range([margin.left, width - margin.right])
    .padding(BAR_PADDING);
  return {
    width,
    height,
    margin,
    zeroY: y(0),
    ticks: axisTicks(y, 5).map((t) => ({ value: t.value, y: t.at, label: t.label })),
    bars: steps.map((s) => {
      const top = y(Math.max(s.from, s.to));
      const bottom = y(Math.min(s.from, s.to));
      return { ...s, x: x(s.key) ?? 0, width: x.bandwidth(), y: top, height: Math.max(1, bottom - top), center: (x(s.key) ?? 0) + x.bandwidth() / 2 };
    }),
  };
}

/**
 * The words under each bar. When any label would lose a word (a phone's narrow bars: "Expan…
 * NPV"), every bar is marked with its number instead and the chart lists the numbers with their
 * labels beside it (`key`), so no name is cut. A bar's label may use its whole band (the bar
 * and its padding).
 */
export function waterfallLabels(
  bars: WaterfallLayout['bars'],
  fontSize: number,
  maxLines: number,
): { lines: string[][]; key: { mark: string; label: string }[] | null } {
  const room = (b: WaterfallLayout['bars'][number]) => b.width / (1 - BAR_PADDING);
  if (bars.every((b) => fitsWhole(b.label, room(b), fontSize, maxLines)))
    return { lines: bars.map((b) => wrapLabel(b.label, room(b), fontSize, maxLines)), key: null };
  const key = bars.map((b, k) => ({ mark: String(k + 1), label: b.label }));
  return { lines: key.map((k) => [k.mark]), key };
}
