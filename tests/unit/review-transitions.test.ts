/**
 * The review status machine, cell by cell: every (role, action, status) gives exactly the
 * outcome in this table, so a change to the workflow shows up here first.
 */
import { describe, expect, it } from 'vitest';
import type { CaseStatus } from '@/db/types';
import { roleNames } from '@/lib/permissions';
import { checkTransition, type ReviewAction } from '@/lib/review/transitions';

const statuses: CaseStatus[] = ['draft', 'in_review', 'approved', 'returned'];
const actions: ReviewAction[] = ['submit', 'approve', 'return', 'withdraw'];

// role → action → status → outcome: the new status, 403 (role) or 409 (status).
const expected: Record<string, Record<ReviewAction, Record<CaseStatus, string>>> = {
  admin: {
    submit: { draft: '403', in_review: '403', approved: '403', returned: '403' },
    approve: { draft: '403', in_review: '403', approved: '403', returned: '403' },
    return: { draft: '403', in_review: '403', approved: '403', returned: '403' },
    withdraw: { draft: '403', in_review: '403', approved: '403', returned: '403' },
  },
  analyst: {
    submit: { draft: 'in_review', in_review: '409', approved: '409', returned: 'in_review' },
    approve: { draft: '403', in_review: '403', approved: '403', returned: '403' },
    return: { draft: '403', in_review: '403', approved: '403', returned: '403' },
    withdraw: { draft: '409', in_review: 'draft', approved: '409', returned: '409' },
  },
  reviewer: {
    submit: { draft: '403', in_review: '403', approved: '403', returned: '403' },
    approve: { draft: '409', in_review: 'approved', approved: '409', returned: '409' },
    return: { draft: '409', in_review: 'returned', approved: '409', returned: '409' },
    withdraw: { draft: '403', in_review: '403', approved: '403', returned: '403' },
  },
  viewer: {
    submit: { draft: '403', in_review: '403', approved: '403', returned: '403' },
    approve: { draft: '403', in_review: '403', approved: '403', returned: '403' },
    return: { draft: '403', in_review: '403', approved: '403', returned: '403' },
    withdraw: { draft: '403', in_review: '403', approved: '403', returned: '403' },
  },
};

describe('review transitions', () => {
  it('allow exactly the cells of the table', () => {
    const got: typeof expected = {};
    for (const role of roleNames)
      for (const action of actions)
        for (const status of statuses) {
          const r = checkTransition(role, action, status);
          ((got[role] ??= {} as never)[action] ??= {} as never)[status] = r.ok ? r.to : r.code === 'forbidden' ? '403' : '409';
        }
    expect(got).toEqual(expected);
  });
});
