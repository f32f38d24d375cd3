/**
 * A case's settings read the same in the board pack, the workbook and the comparison as in the
 * editor: the tree by its name, the cash-flow timing, where the volatility comes from, the case's
 * status and the kind of each right. The pack printed "crr, 96 steps" a page after "A CRR
 * binomial lattice", and the workbook "crr", "end-of-year", "direct: …", "in_review" and
 * "expand". The engine's warnings read in the pack as in Results. The demo plant (invented figures).
 */
import { describe, expect, it } from 'vitest';
import { demoBoardPackData, demoPlant } from '@/demo/board-pack-data';
import { renderBoardPack } from '@/lib/board-pack/render';
import { comparisonRows } from '@/lib/comparison-rows';
import { readCaseWorkbook } from './support/case-workbook';
import { pdfText } from './support/demo-pack';
import { warningSentence } from '@/lib/warning-words';

const { inputs, model } = demoPlant();
// Mid-year and Tian, so that no default hides a raw id.
const changed = {
  ...inputs,
  cashFlows: { ...inputs.cashFlows, timing: 'mid-year' as const },
  settings: { ...inputs.settings, tree: 'tian' as const, volatilitySource: { method: 'history' as const, note: 'Five years of invented monthly values.' } },
};
const words = {
  tree: 'Tian (1993, third moment)',
  timing: 'Mid-year',
  source: 'Estimated from history: Five years of invented monthly values.',
};

describe('the words for a case’s settings', () => {
  it('are the same in the workbook, the board pack and the comparison', async () => {
    const data = demoBoardPackData('A4', { inputs: changed });
    const book = await readCaseWorkbook(changed, data.snapshot.result, 'in_review');
    const cells = (sheet: string) =>
      book
        .getWorksheet(sheet)!
        .getSheetValues()
        .flatMap((row) => (Array.isArray(row) ? row.map(String) : []));
    expect(cells('Settings')).toEqual(expect.arrayContaining([words.tree, words.timing, words.source]));
    expect(cells('Summary')).toContain('In review');
    expect(cells('Results')).toEqual(expect.arrayContaining(['Expand', 'Abandon']));

    // pdftotext breaks lines where the page does: compare with spaces made single.
    const pack = pdfText(await renderBoardPack(data)).replace(/\s+/g, ' ');
    expect(pack).toContain(`${words.tree}, ${model.steps} steps`);
    expect(pack).toContain(`A ${words.tree} binomial lattice`);
    expect(pack).toContain(`Cash-flow timing ${words.timing}`);
    expect(pack).toContain(words.source);

    const compared = Object.fromEntries(comparisonRows([inputs, changed], [null, null], ['EUR', 'EUR']).map((r) => [r.label, r.values[1]]));
    expect([compared['Tree'], compared['Cash-flow timing'], compared['Where the volatility comes from']]).toEqual([words.tree, words.timing, words.source]);
  });

  it('the engine’s warnings read in the board pack as Results shows them', async () => {
    // The pack was silent where Results warned: the demo plant's lattice error band (± 1.88 on
    // an expanded NPV of 20.1 at 96 steps) is over 1 % of it.
    const data = demoBoardPackData('A4');
    const warnings = data.snapshot.result.warnings;
    expect(warnings.some((w) => w.includes('lattice error band'))).toBe(true);
    const pack = pdfText(await renderBoardPack(data)).replace(/\s+/g, ' ');
    for (const w of warnings) expect(pack).toContain(warningSentence(w).replace(/\s+/g, ' '));
  });
});
