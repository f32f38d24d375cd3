/**
 * Evaluates a cost (or proceeds, when negative) at a time. A cost is one of:
 * - a number: the same amount at every time;
 * - `{amount, growth}`: amount·e^{growth·t}, e.g. a capex quote that escalates with inflation;
 * - a step schedule `[{from, amount}, …]` in time order: the amount of the last entry whose
 *   `from` is ≤ t (before the first entry, the first entry's amount applies).
 *
 * @example costAt([{ from: 0, amount: 50 }, { from: 2, amount: 40 }], 3) // 40
 */
import type { Cost } from './schema';
import type { Money, Years } from './units';

export function costAt(cost: Cost, t: Years): Money {
  if (typeof cost === 'number') return cost;
  if (!Array.isArray(cost)) return cost.amount * Math.exp(cost.growth * t);
  let amount = cost[0]!.amount;
  for (const entry of cost) {
    if (entry.from <= t) amount = entry.amount;
    else break;
  }
  return amount;
}

/** Scales every amount of a cost by a factor (used by the sensitivities). */
export function scaleCost(cost: Cost, factor: number): Cost {
  if (typeof cost === 'number') return cost * factor;
  if (!Array.isArray(cost)) return { amount: cost.amount * factor, growth: cost.growth };
  return cost.map((entry) => ({ from: entry.from, amount: entry.amount * factor }));
}

/** Negates a cost: proceeds (salvage, savings) are negative costs. */
export function negateCost(cost: Cost): Cost {
  return scaleCost(cost, -1);
}
