/**
 * The board pack data of the demo plant's base case (invented company, people and figures),
 * built without a database: for looking at the pages while working on the layout
 * (scripts/dev/render-board-pack.tsx), for `npm run bench`, and for the pack's tests. The record
 * shows a return and a withdrawal before the approval, so every kind of event is drawn.
 */
import { valueProject, type ProjectModel, type ValuationResult } from '@/lattice';
import type { BoardPackData, PageSize } from '@/lib/board-pack/data';
import { caseToModel } from '@/lib/case-model';
import { hashModel } from '@/lib/model-hash';
import type { CaseInput } from '@/lib/validations/case';
import { demoPortfolio } from './portfolio';

/** The demo plant's base case and its engine model. */
export function demoPlant(): { inputs: CaseInput; model: ProjectModel } {
  const inputs = demoPortfolio.find((p) => p.name === 'Phased bio-resin plant')!.cases[0]!;
  return { inputs, model: caseToModel(inputs).model };
}

export function demoBoardPackData(
  pageSize: PageSize = 'A4',
  changes: { inputs?: CaseInput; projectName?: string; caseName?: string; result?: ValuationResult } = {},
): BoardPackData {
  const plant = demoPlant();
  const inputs = changes.inputs ?? plant.inputs;
  const model = changes.inputs ? caseToModel(inputs).model : plant.model;
  const result = changes.result ?? valueProject(model);
  const analyst = 'Priya Lindqvist';
  const reviewer = 'Tomasz Okafor';
  return {
    pageSize,
    organisation: 'Kestrel Bay Materials',
    isDemo: true,
    project: { name: changes.projectName ?? 'Phased bio-resin plant', description: 'Invented demo figures, EUR millions.', currency: 'EUR' },
    snapshot: {
      id: 'demo-snapshot',
      caseName: changes.caseName ?? inputs.name,
      caseVersion: 3,
      inputs,
      model,
      result,
      engineVersion: result.engineVersion,
      inputHash: hashModel(model),
      submittedBy: analyst,
      submittedAt: '2026-11-30T09:00:00.000Z',
      decidedBy: reviewer,
      decidedAt: '2026-12-01T15:30:00.000Z',
      recommendation:
        'Approve phase 1 now. On its own the plan does not pay back, but the right to add phase 2 and the sale option carry it: commit to phase 2 only above its boundary in years 2–4, and sell below the sale boundary. (Invented demo text.)',
    },
    record: [
      { kind: 'submitted', caseVersion: 1, by: analyst, at: '2026-11-20T10:00:00.000Z' },
      { kind: 'returned', caseVersion: 1, by: reviewer, at: '2026-11-21T16:10:00.000Z', reason: 'Justify the volatility before approval.' },
      { kind: 'submitted', caseVersion: 2, by: analyst, at: '2026-11-27T08:45:00.000Z' },
      { kind: 'withdrawn', caseVersion: 2, by: analyst, at: '2026-11-27T11:20:00.000Z' },
      { kind: 'submitted', caseVersion: 3, by: analyst, at: '2026-11-30T09:00:00.000Z' },
      { kind: 'approved', caseVersion: 3, by: reviewer, at: '2026-12-01T15:30:00.000Z' },
    ],
  };
}
