/** How snapshots appear in the API. */
import type { CaseSnapshot } from '@/db/types';

export function presentSnapshot(s: CaseSnapshot) {
  return {
    id: s.id,
    caseId: s.case_id,
    caseVersion: s.case_version,
    caseName: s.case_name,
    status: s.status,
    engineVersion: s.engine_version,
    inputHash: s.input_hash,
    submittedAt: s.submitted_at,
    decidedAt: s.decided_at,
    decisionReason: s.decision_reason,
    recommendation: s.recommendation,
  };
}
