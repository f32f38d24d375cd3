/**
 * Renders the demo plant's base case as a board pack to a file, without a database, for looking
 * at the pages while working on the layout: npx tsx scripts/dev/render-board-pack.tsx out.pdf [A4|LETTER]
 */
import { writeFileSync } from 'node:fs';
import { demoBoardPackData } from '@/demo/board-pack-data';
import { renderBoardPack } from '@/lib/board-pack/render';

const [out = '/tmp/board-pack.pdf', size = 'A4'] = process.argv.slice(2);
const pdf = await renderBoardPack(demoBoardPackData(size === 'LETTER' ? 'LETTER' : 'A4'));
writeFileSync(out, pdf);
console.log(`${out}: ${pdf.length} bytes`);
