/** The demo plant's board pack rendered from a given result, and a PDF's text as pdftotext reads it (tests/support/pdf-text.ts). */
import { demoBoardPackData, demoPlant } from '@/demo/board-pack-data';
import type { ProjectModel, ValuationResult } from '@/lattice';
import { renderBoardPack } from '@/lib/board-pack/render';

export { demoPlant };

export async function renderPlantPack(model: ProjectModel, result: ValuationResult): Promise<Buffer> {
  const data = demoBoardPackData('A4', { result });
  return renderBoardPack({ ...data, snapshot: { ...data.snapshot, model } });
}

export { pdfText } from '../../support/pdf-text';
