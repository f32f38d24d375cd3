/**
 * An option's terms in one sentence, for readers who never see the option cards:
 * "expand by 50 % for EUR 95.0, any time in years 2–4".
 */
import { rightIds, type Cost, type ExerciseWindow, type OptionTemplate } from '@/lattice';
import { formatMoney, formatPercent } from './format';

export function describeCost(cost: Cost, currency?: string): string {
  if (typeof cost === 'number') return formatMoney(cost, currency);
  if (Array.isArray(cost)) return cost.map((s) => `${formatMoney(s.amount, currency)} from year ${s.from}`).join(', then ');
  return `${formatMoney(cost.amount, currency)} growing ${formatPercent(cost.growth)} a year`;
}

export function describeWindow(w: ExerciseWindow | undefined): string {
  if (!w) return 'at any time';
  if (w.kind === 'american') return w.from === w.to ? `in year ${w.from}` : `any time in years ${w.from}–${w.to}`;
  if (w.kind === 'bermudan') return `in years ${w.dates.join(', ')}`;
  return `in year ${w.at} only`;
}

export function describeOption(o: OptionTemplate, currency?: string): string {
  switch (o.kind) {
    case 'expand':
      return `expand by ${formatPercent(o.factor, 0)} of the project for ${describeCost(o.cost, currency)}, ${describeWindow(o.window)}`;
    case 'contract':
      return `give up ${formatPercent(o.fraction, 0)} of the project for savings of ${describeCost(o.savings, currency)}, ${describeWindow(o.window)}`;
    case 'abandon':
      return `abandon for a salvage value of ${describeCost(o.salvage, currency)}, ${describeWindow(o.window)}`;
    case 'defer':
      return `invest ${describeCost(o.cost, currency)} ${describeWindow(o.window)}, or never`;
    case 'stage':
      return `pay in stages: ${o.payments.map((p) => `${formatMoney(p.amount, currency)} in year ${p.at}`).join(', ')}; stopping at any stage`;
    case 'mothball':
      return `mothball to ${formatPercent(o.toScale, 0)} of scale for ${describeCost(o.cost, currency)} and restart for ${describeCost(o.backCost, currency)}, with a cash flow of ${formatMoney(o.flowPerYear ?? 0, currency)} a year while mothballed, ${describeWindow(o.window)}`;
  }
}

/** Each right with the id its figures go by (an unnamed one: `expand-1`, …) and its terms. */
export function describeRights(options: OptionTemplate[] | undefined, currency?: string): { id: string; option: OptionTemplate; terms: string }[] {
  const list = options ?? [];
  const ids = rightIds(list);
  return list.map((option, k) => ({ id: ids[k]!, option, terms: describeOption(option, currency) }));
}
