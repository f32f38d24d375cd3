/** The demo plant's board pack rendered from a given result, and a PDF's text as pdftotext reads it. */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { demoPortfolio } from '@/demo/portfolio';
import type { ProjectModel, ValuationResult } from '@/lattice';
import { renderBoardPack } from '@/lib/board-pack/render';
import { caseToModel } from '@/lib/case-model';

/** The demo plant's base case (invented figures) and its engine model. */
export function demoPlant() {
  const inputs = demoPortfolio.find((p) => p.name === 'Phased bio-resin plant')!.cases[0]!;
  return { inputs, model: caseToModel(inputs).model };
}

export async function renderPlantPack(model: ProjectModel, result: ValuationResult): Promise<Buffer> {
  const { inputs } = demoPlant();
  const when = new Date('2026-01-01T00:00:00Z').toISOString();
  return renderBoardPack({
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
}

/** The PDF's text with runs of white space as one space (`layout` keeps columns side by side). */
export function pdfText(pdf: Buffer, { layout = false } = {}): string {
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'leeway-pack-')), 'pack.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', [...(layout ? ['-layout'] : []), file, '-'])
    .toString()
    .replace(/\s+/g, ' ');
}
