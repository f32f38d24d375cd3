/**
 * The board pack's lattice excerpt shows the project's own values: its first node is the
 * project in the mode it starts in, worth the valuation's root value. The first packs took the
 * first key of the stored result's modes, and PostgreSQL's jsonb returns an object's keys
 * shortest first ("closed" before "operating"), so they drew the closed mode and printed
 * "W 0.0" on every node. Rendered from the demo plant (invented figures) with its result as
 * jsonb returns it, and read back with pdftotext, as a reader's tools would.
 */
import { describe, expect, it } from 'vitest';
import { valueProject } from '@/lattice';
import { formatMoney } from '@/lib/format';
import { demoPlant, pdfText, renderPlantPack } from './support/demo-pack';

describe('the board pack lattice excerpt', () => {
  it('starts from the root value of the mode the project is in today', async () => {
    const { model } = demoPlant();
    const computed = valueProject(model);
    // Key order as jsonb stores it: by length, then bytewise (PostgreSQL manual, "JSON Types").
    const jsonbOrder = (a: string, b: string) => a.length - b.length || (a < b ? -1 : a > b ? 1 : 0);
    const modes = Object.fromEntries(Object.entries(computed.modes).sort(([a], [b]) => jsonbOrder(a, b)));
    const result = { ...computed, modes };
    const text = pdfText(await renderPlantPack(model, result), { layout: true });
    const nodeValues = [...text.matchAll(/W (-?[\d,]+\.\d)/g)].map((m) => m[1]);
    // Steps 0–4 of the excerpt: 1 + 2 + 3 + 4 + 5 nodes.
    expect(nodeValues).toHaveLength(15);
    expect(text).toContain(`W ${formatMoney(result.value, undefined, 1)}`);
    expect(nodeValues.filter((v) => v === '0.0')).toEqual([]);
  }, 60_000);
});
