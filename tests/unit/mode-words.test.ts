/** Operating modes in words (ids as lattice/compile-templates.ts builds them). */
import { describe, expect, it } from 'vitest';
import { compileTemplates } from '@/lattice/compile-templates';
import { modeLabel } from '@/lib/mode-words';

describe('mode labels', () => {
  it.each([
    ['operating', 'Operating'],
    ['operating+Phase 2', 'Operating, after Phase 2'],
    ['operating+Phase 2+Trim', 'Operating, after Phase 2 and Trim'],
    ['operating (Mothball)', 'Operating, Mothball in force'],
    ['operating+Phase 2 (Mothball)', 'Operating, after Phase 2, Mothball in force'],
    ['closed', 'Closed (sold or abandoned)'],
    ['waiting', 'Not built yet (waiting to invest)'],
    ['Pilot funding payment 2 due', 'Pilot funding payment 2 due'],
  ])('%j reads %j', (id, label) => expect(modeLabel(id)).toBe(label));

  it('names every mode the compiler makes without its internal punctuation', () => {
    const compiled = compileTemplates({
      underlying: { value: 100, volatility: 0.3 },
      riskFreeRate: 0.03,
      horizon: 3,
      steps: 10,
      options: [
        { kind: 'expand', id: 'Phase 2', factor: 0.5, cost: 40, window: { kind: 'american', from: 0, to: 3 } },
        { kind: 'mothball', id: 'Mothball', toScale: 0, cost: 1, backCost: 2 },
        { kind: 'abandon', id: 'Sell', salvage: 50, window: { kind: 'american', from: 0, to: 3 } },
      ],
    });
    for (const mode of compiled.modes) expect(modeLabel(mode.id).replace(' (sold or abandoned)', '')).not.toMatch(/[+()]/);
  });
});
