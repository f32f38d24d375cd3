/**
 * Renders a board pack to PDF bytes, with Work Sans embedded (./pdf-parts.tsx). The lattice excerpt is computed
 * here from the snapshot's model, so the document depends on the snapshot alone.
 */
import { renderToBuffer } from '@react-pdf/renderer';
import { valueProject } from '@/lattice';
import type { BoardPackData } from './data';
import { BoardPackDocument } from './document';
import { registerFonts } from './pdf-parts';

export async function renderBoardPack(data: BoardPackData): Promise<Buffer> {
  registerFonts();
  const run = data.excerpt ? null : valueProject(data.snapshot.model, { extras: false, grid: { steps: 4 } });
  const excerpt = data.excerpt ?? (run?.grid ? { grid: run.grid, startMode: run.startMode } : undefined);
  return renderToBuffer(<BoardPackDocument data={{ ...data, excerpt }} />);
}
