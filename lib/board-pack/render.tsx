/**
 * Renders a board pack to PDF bytes. Work Sans is embedded from the files the app ships
 * (@fontsource/work-sans; react-pdf reads .woff, not .woff2). The lattice excerpt is computed
 * here from the snapshot's model, so the document depends on the snapshot alone.
 */
import path from 'node:path';
import { Font, renderToBuffer } from '@react-pdf/renderer';
import { valueProject } from '@/lattice';
import type { BoardPackData } from './data';
import { BoardPackDocument } from './document';

let fontsReady = false;

function registerFonts() {
  if (fontsReady) return;
  const file = (weight: number) =>
    path.join(/*turbopackIgnore: true*/ process.cwd(), 'node_modules', '@fontsource', 'work-sans', 'files', `work-sans-latin-${weight}-normal.woff`);
  Font.register({ family: 'Work Sans', fonts: [400, 500, 600, 700].map((fontWeight) => ({ src: file(fontWeight), fontWeight })) });
  // Words are never hyphenated: a board member should not read "expan-ded".
  Font.registerHyphenationCallback((word) => [word]);
  fontsReady = true;
}

export async function renderBoardPack(data: BoardPackData): Promise<Buffer> {
  registerFonts();
  const run = data.excerpt ? null : valueProject(data.snapshot.model, { extras: false, grid: { steps: 4 } });
  const excerpt = data.excerpt ?? (run?.grid ? { grid: run.grid, startMode: run.startMode } : undefined);
  return renderToBuffer(<BoardPackDocument data={{ ...data, excerpt }} />);
}
