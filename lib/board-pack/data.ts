/** Everything a board pack shows, gathered from one approved snapshot (and nothing else). */
import type { NodeGrid, ProjectModel, ValuationResult } from '@/lattice';
import type { CaseInput } from '../validations/case';

export type PageSize = 'A4' | 'LETTER';

/** Every page size a pack is rendered in, all of them at approval. */
export const pageSizes: PageSize[] = ['A4', 'LETTER'];

/** One step of the case's road to this approval, as frozen in its snapshots. */
export interface RecordEvent {
  kind: 'submitted' | 'returned' | 'withdrawn' | 'approved';
  caseVersion: number;
  by: string;
  at: string;
  /** A return's reason. */
  reason?: string;
}

export interface FollowThrough {
  caseVersion: number;
  approvedAt: string;
  observations: { date: string; value: number; source: string }[];
  decisions: { date: string; right: string; decision: string; reason: string; by: string }[];
}

export interface BoardPackData {
  pageSize: PageSize;
  organisation: string;
  isDemo: boolean;
  project: { name: string; description: string; currency: string };
  snapshot: {
    id: string;
    caseName: string;
    caseVersion: number;
    inputs: CaseInput;
    model: ProjectModel;
    result: ValuationResult;
    engineVersion: string;
    inputHash: string;
    submittedBy: string;
    submittedAt: string;
    decidedBy: string;
    decidedAt: string;
    /** The analyst's recommendation, written at submission; null for a snapshot from before written recommendations. */
    recommendation: string | null;
  };
  /** Every submission of the case up to this one and what became of it, oldest first, ending with this approval. */
  record: RecordEvent[];
  /**
   * How the version approved before this one was followed until this submission: the values
   * recorded and the decisions taken on its rights (only what was recorded by then, so the pack
   * never changes). Absent for a first approval.
   */
  followThrough?: FollowThrough;
  /** The first steps of the lattice and the mode it starts in, for the diagram; computed from the snapshot's model. */
  excerpt?: { grid: NodeGrid; startMode: string };
}
