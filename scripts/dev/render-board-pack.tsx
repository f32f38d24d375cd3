/**
 * Renders the demo plant's base case as a board pack to a file, without a database, for looking
 * at the pages while working on the layout: npx tsx scripts/dev/render-board-pack.tsx out.pdf [A4|LETTER]
 */
import { writeFileSync } from 'node:fs';
import { valueProject } from '@/lattice';
import { demoPortfolio } from '@/demo/portfolio';
import { renderBoardPack } from '@/lib/board-pack/render';
import { caseToModel } from '@/lib/case-model';
import { hashModel } from '@/lib/model-hash';

const [out = '/tmp/board-pack.pdf', size = 'A4'] = process.argv.slice(2);
const project = demoPortfolio[0]!;
const inputs = project.cases[0]!;
const { model } = caseToModel(inputs);
const result = valueProject(model);
const pdf = await renderBoardPack({
  pageSize: size === 'LETTER' ? 'LETTER' : 'A4',
  organisation: 'Kestrel Bay Materials',
  isDemo: true,
  project: { name: project.name, description: project.description, currency: 'EUR' },
  snapshot: {
    id: 'dev-snapshot',
    caseName: inputs.name,
    caseVersion: 1,
    inputs,
    model,
    result,
    engineVersion: result.engineVersion,
    inputHash: hashModel(model),
    submittedBy: 'Priya Lindqvist',
    submittedAt: '2026-11-30T09:00:00.000Z',
    decidedBy: 'Tomasz Okafor',
    decidedAt: '2026-12-01T15:30:00.000Z',
  },
});
writeFileSync(out, pdf);
console.log(`${out}: ${pdf.length} bytes`);
