/** The shape of a case as the API sends it to the browser (dates as ISO text). */
import type { CashFlowSchedule } from './cash-flows';
import type { CaseInput } from './validations/case';
import type { OptionTemplate } from '@/lattice';

export interface CaseJson {
  id: string;
  projectId: string;
  name: string;
  version: number;
  status: string;
  cashFlows: CashFlowSchedule;
  settings: CaseInput['settings'];
  options: OptionTemplate[];
  createdAt: string;
  updatedAt: string;
  /** The latest run: its figures and the case version they are of (lower than `version` when edited since). */
  latest?: {
    runId: string;
    caseVersion: number;
    engineVersion: string;
    staticNpv: number;
    optionPremium: number;
    expandedNpv: number;
    valuedAt: string;
  } | null;
}

export interface ProjectJson {
  id: string;
  name: string;
  description: string;
  currency: string;
  status: 'active' | 'archived';
  ownerId: string | null;
  createdAt: string;
  updatedAt: string;
}

/** One entry of a project's audit trail as the API sends it. */
export interface ActivityJson {
  id: string;
  action: string;
  subjectType: string;
  subjectId: string | null;
  detail: Record<string, unknown>;
  actor: string | null;
  at: string;
}
