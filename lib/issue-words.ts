/**
 * The engine names a field by its path in the model ("options[4].window.to must be ≤ horizon");
 * a person knows the right by the name on its card. This rewrites each path into words:
 * "right “Phase 2” (window closes (to)) must be ≤ horizon".
 */
import type { OptionTemplate } from '@/lattice';

const parts: Record<string, string> = {
  window: 'window',
  from: 'opens (from)',
  to: 'closes (to)',
  at: 'date (at)',
  dates: 'dates',
  cost: 'cost',
  salvage: 'salvage',
  savings: 'savings',
  payments: 'payment',
  amount: 'amount',
  backCost: 'cost to restart',
};

export function issueInWords(message: string, options: OptionTemplate[]): string {
  return message.replace(/options\[(\d+)\]((?:\.\w+|\[\d+\])*)/g, (_, index: string, rest: string) => {
    const k = Number(index);
    const name = options[k]?.id ?? `Right ${k + 1}`;
    const path = rest
      .split(/\.|\[|\]/)
      .filter(Boolean)
      .map((p) => (/^\d+$/.test(p) ? String(Number(p) + 1) : (parts[p] ?? p)))
      .join(' ');
    return `right “${name}”${path ? ` (${path})` : ''}`;
  });
}
