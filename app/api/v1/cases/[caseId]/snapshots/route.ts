// GET /api/v1/cases/{id}/snapshots – the case's review history: every frozen snapshot and its decision, and for a
// submission in review what changed since the version last returned and whether the same inputs were approved before
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { readReviewHistory } from '@/lib/review/history';

export const dynamic = 'force-dynamic';

export const GET = withAuth<{ caseId: string }>(async ({ member, params }) => {
  const { found, snapshots, changes } = await readReviewHistory(member, params.caseId);
  return NextResponse.json({
    status: found.status,
    changes,
    snapshots: snapshots.map((s) => ({
      id: s.id,
      caseVersion: s.case_version,
      caseName: s.case_name,
      status: s.status,
      submittedAt: s.submitted_at,
      submittedBy: s.submitted_by_name,
      // Only whoever submitted a version may withdraw it (the panel offers it to them alone).
      submittedByYou: s.submitted_by === member.userId,
      decidedAt: s.decided_at,
      decidedBy: s.decided_by_name,
      decisionReason: s.decision_reason,
      recommendation: s.recommendation,
      engineVersion: s.engine_version,
      inputHash: s.input_hash,
      staticNpv: s.static_npv,
      optionPremium: s.option_premium,
      expandedNpv: s.expanded_npv,
    })),
  });
}, operations.listSnapshots);
