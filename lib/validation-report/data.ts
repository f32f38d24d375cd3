/** Everything a validation report shows, for one saved version of a case (lib/validation-report/gather.ts). */
import type { ProjectModel, ValuationResult } from '@/lattice';
import type { CrossCheckResult } from '../cross-check/run';
import type { PageSize } from '../board-pack/data';
import type { CaseInput } from '../validations/case';
import type { ReferenceResults } from './reference-results';

export interface ValidationReportData {
  pageSize: PageSize;
  organisation: string;
  isDemo: boolean;
  generatedAt: string;
  project: { name: string; currency: string };
  caseName: string;
  caseVersion: number;
  inputs: CaseInput;
  model: ProjectModel;
  /** The version valued now, with its extras (convergence, the premium split, sensitivities). */
  result: ValuationResult;
  inputHash: string;
  resultHash: string;
  /** The newest finished cross-check of this version, if one was run. */
  crossCheck: { paths: number; seed: number; engineVersion: string; at: string; result: CrossCheckResult } | null;
  /** The engine's published-value checks as built (null when this build has none). */
  references: ReferenceResults | null;
}
