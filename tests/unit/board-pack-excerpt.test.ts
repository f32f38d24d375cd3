/**
 * The board pack's lattice excerpt shows the project's own values: its first node is the
 * project in the mode it starts in, worth the valuation's root value. The first packs took the
 * first key of the stored result's modes, and PostgreSQL's jsonb returns an object's keys
 * shortest first ("closed" before "operating"), so they drew the closed mode and printed
 * "W 0.0" on every node. Rendered from the demo plant (invented figures) with its result as
 * jsonb returns it, and read back with pdftotext, as a reader's tools would.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoPortfolio } from '@/demo/portfolio';
import { valueProject } from '@/lattice';
import { renderBoardPack } from '@/lib/board-pack/render';
import { caseToModel } from '@/lib/case-model';
import { formatMoney } from '@/lib/format';

function pdfText(pdf: Buffer): string {
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'leeway-excerpt-')), 'pack.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-layout', file, '-']).toString().replace(/\s+/g, ' ');
}

describe('the board pack lattice excerpt', () => {
  it('starts from the root value of the mode the project is in today', async () => {
    const inputs = demoPortfolio.find((p) => p.name === 'Phased bio-resin plant')!.cases[0]!;
    const { model } = caseToModel(inputs);
    const computed = valueProject(model);
    // Key order as jsonb stores it: by length, then bytewise (PostgreSQL manual, "JSON Types").
    const jsonbOrder = (a: string, b: string) => a.length - b.length || (a < b ? -1 : a > b ? 1 : 0);
    const modes = Object.fromEntries(Object.entries(computed.modes).sort(([a], [b]) => jsonbOrder(a, b)));
    const result = { ...computed, modes };
    const when = new Date('2026-01-01T00:00:00Z').toISOString();
    const pdf = await renderBoardPack({
      pageSize: 'A4',
      organisation: 'Invented Test Organisation',
      isDemo: true,
      project: { name: 'Phased bio-resin plant', description: 'Invented', currency: 'EUR' },
      snapshot: {
        id: 'test',
        caseName: inputs.name,
        caseVersion: 1,
        inputs,
        model,
        result,
        engineVersion: result.engineVersion,
        inputHash: 'test',
        submittedBy: 'A',
        submittedAt: when,
        decidedBy: 'B',
        decidedAt: when,
      },
    });
    const text = pdfText(pdf);
    const nodeValues = [...text.matchAll(/W (-?[\d,]+\.\d)/g)].map((m) => m[1]);
    // Steps 0–4 of the excerpt: 1 + 2 + 3 + 4 + 5 nodes.
    expect(nodeValues).toHaveLength(15);
    expect(text).toContain(`W ${formatMoney(result.value, undefined, 1)}`);
    expect(nodeValues.filter((v) => v === '0.0')).toEqual([]);
  }, 60_000);
});
