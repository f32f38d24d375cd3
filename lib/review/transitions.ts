/**
 * The review workflow's status machine, written once: which action moves a case from which
 * status to which, and which permission it needs. The server checks both for every action
 * inside the transaction that changes the status (db/queries/reviews.ts).
 *
 *   draft ──submit──▶ in_review ──approve──▶ approved
 *     ▲                  │
 *     │               return (with a reason)
 *     │                  ▼
 *     ├──── (edit) ── returned ──submit──▶ in_review
 *     │
 *     ├── withdraw (by whoever submitted) ── in_review
 *     │
 *     └── start a revision ── approved
 *
 * Saving edits to a returned case makes it a draft again. An approved case is changed only by
 * an explicit revision, which makes it a draft at the next version and leaves the approved
 * snapshot and its board pack as they are; a case in review cannot be edited.
 */
import type { CaseStatus, SnapshotStatus } from '@/db/types';

export type { CaseStatus, SnapshotStatus };
import { roleAllows, type Permission, type RoleName } from '../permissions';

export type ReviewAction = 'submit' | 'approve' | 'return' | 'withdraw';

export const transitions: Record<ReviewAction, { from: CaseStatus[]; to: CaseStatus; permission: Permission }> = {
  submit: { from: ['draft', 'returned'], to: 'in_review', permission: { case: ['submit'] } },
  approve: { from: ['in_review'], to: 'approved', permission: { review: ['decide'] } },
  return: { from: ['in_review'], to: 'returned', permission: { review: ['decide'] } },
  // The submitter's own change of mind; db/queries/reviews.ts checks that it is theirs.
  withdraw: { from: ['in_review'], to: 'draft', permission: { case: ['submit'] } },
};

const pastTense: Record<ReviewAction, string> = { submit: 'submitted', approve: 'approved', return: 'returned', withdraw: 'withdrawn' };

/** Words for a case's status and for a snapshot's (a withdrawn submission is a snapshot's only). */
export const statusLabels: Record<CaseStatus | SnapshotStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  approved: 'Approved',
  returned: 'Returned',
  withdrawn: 'Withdrawn',
};

export type TransitionCheck = { ok: true; to: CaseStatus } | { ok: false; code: 'forbidden' | 'conflict'; message: string };

export function checkTransition(role: RoleName, action: ReviewAction, status: CaseStatus): TransitionCheck {
  const rule = transitions[action];
  if (!roleAllows(role, rule.permission)) return { ok: false, code: 'forbidden', message: `Your role cannot ${action} a case.` };
  if (!rule.from.includes(status))
    return {
      ok: false,
      code: 'conflict',
      message: `A case that is ${statusLabels[status].toLowerCase()} cannot be ${pastTense[action]}.`,
    };
  return { ok: true, to: rule.to };
}
