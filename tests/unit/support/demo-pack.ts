/** The demo plant's board pack rendered from a given result, and a PDF's text as pdftotext reads it. */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { demoBoardPackData, demoPlant } from '@/demo/board-pack-data';
import type { ProjectModel, ValuationResult } from '@/lattice';
import { renderBoardPack } from '@/lib/board-pack/render';

export { demoPlant };

export async function renderPlantPack(model: ProjectModel, result: ValuationResult): Promise<Buffer> {
  const data = demoBoardPackData('A4', { result });
  return renderBoardPack({ ...data, snapshot: { ...data.snapshot, model } });
}

/** The PDF's text with runs of white space as one space (`layout` keeps columns side by side). */
export function pdfText(pdf: Buffer, { layout = false } = {}): string {
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'leeway-pack-')), 'pack.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', [...(layout ? ['-layout'] : []), file, '-'])
    .toString()
    .replace(/\s+/g, ' ');
}
