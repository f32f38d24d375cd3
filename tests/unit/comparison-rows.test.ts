/**
 * The comparison rows mark every difference in the inputs, however small, and show it in the
 * text (cash flows year by year, rates to every typed decimal, the volatility's source), while
 * equal inputs give no "differs" at all. Built on the demo plant (invented figures).
 */
import { describe, expect, it } from 'vitest';
import { demoPlant } from '@/demo/board-pack-data';
import { valueProject } from '@/lattice';
import { caseToModel } from '@/lib/case-model';
import { comparisonRows } from '@/lib/comparison-rows';
import type { CaseInput } from '@/lib/validations/case';

const { inputs } = demoPlant();
const differing = (a: CaseInput, b: CaseInput) =>
  comparisonRows([a, b], [null, null], ['EUR', 'EUR'])
    .filter((r) => r.differs)
    .map((r) => [r.label, ...r.values]);

describe('comparisonRows', () => {
  it('finds no difference between a case and itself', () => {
    expect(differing(inputs, structuredClone(inputs))).toEqual([]);
  });

  it('marks a cash-flow cell changed by a hundredth, showing both values whole', () => {
    const changed = structuredClone(inputs);
    changed.cashFlows.rows[3]!.operatingCost += 0.01;
    const before = inputs.cashFlows.rows[3]!.operatingCost;
    expect(differing(inputs, changed)).toEqual([
      ['Underlying value V₀', expect.any(String), expect.any(String)],
      ['Operating cost, year 3', String(before), String(before + 0.01)],
    ]);
  });

  it('shows a rate to every typed decimal, and where the volatility comes from', () => {
    const changed = structuredClone(inputs);
    changed.cashFlows.wacc = 0.0851;
    changed.settings.volatilitySource = { method: 'history', note: 'Five years of invented monthly values.' };
    const rows = differing(inputs, changed);
    expect(rows).toContainEqual(['WACC', '8.5 %', '8.51 %']);
    expect(rows.find((r) => r[0] === 'Where the volatility comes from')?.[2]).toBe('Estimated from history: Five years of invented monthly values.');
  });

  it('names the tree as the settings do, not by its id ("crr")', () => {
    const changed = structuredClone(inputs);
    changed.settings.tree = 'tian';
    expect(differing(inputs, changed)).toContainEqual(['Tree', 'Cox–Ross–Rubinstein (1979)', 'Tian (1993, third moment)']);
  });

  it('lines up schedules of different lengths, a missing year shown empty', () => {
    const longer = structuredClone(inputs);
    const last = longer.cashFlows.rows.at(-1)!;
    longer.cashFlows.rows.push({ ...last, year: last.year + 1 });
    const extra = comparisonRows([inputs, longer], [null, null], ['EUR', 'EUR']).find((r) => r.label === `Revenue, year ${last.year + 1}`)!;
    expect(extra.values).toEqual([null, String(last.revenue)]);
    expect(extra.differs).toBe(true);
  });

  it('finds the figures of unnamed rights under the ids the result gives them, in the Rights group', () => {
    const unnamed = { ...structuredClone(inputs), options: inputs.options!.map(({ id: _id, ...o }) => o) };
    const result = valueProject(caseToModel(unnamed).model);
    const rows = comparisonRows([unnamed], [result], ['EUR']).filter((r) => r.group === 'Rights' && r.label.endsWith(': incremental value'));
    expect(rows.map((r) => r.label)).toEqual(result.rights.map((r) => `${r.id}: incremental value`));
    expect(rows.map((r) => r.numbers![0])).toEqual(result.rights.map((r) => r.incremental));
    expect(result.rights.every((r) => r.incremental !== null)).toBe(true);
  });
});
