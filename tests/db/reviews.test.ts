/**
 * The review workflow on a real PostgreSQL: transitions through the queries the routes use, two
 * reviewers approving at once (exactly one wins), a snapshot that stays byte-identical when the
 * case is edited afterwards, a case in review that cannot be saved, a resubmission that
 * recognises its inputs in an approval stored by an older engine, and one stored board pack per
 * approval and page size whichever render stores it first.
 */
import { checkTransition } from '@/lib/review/transitions';
import { sql } from 'kysely';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { db } from '@/db';
import { createCase, saveCase, startRevision } from '@/db/queries/cases';
import { createProject } from '@/db/queries/projects';
import { decideCase, submitCase } from '@/db/queries/reviews';
import { saveBoardPack } from '@/lib/board-pack/records';
import { versionChanges } from '@/lib/review/version-changes';
import { minimalCase, seededDemo } from './support/demo';

// version-changes.ts is server-only; here it runs in plain Node against the test database.
vi.mock('server-only', () => ({}));

let kestrel = '';
let harrow = '';
let analyst = '';
let reviewer = '';

const content = { ...minimalCase, name: 'Review case' };
const frozen = { inputs: content, model: { steps: 10 }, result: { expandedNpv: 12.5, staticNpv: 10 }, engineVersion: 'test', inputHash: 'abc' };

async function freshCase() {
  const project = await createProject(db, { orgId: kestrel, ownerId: analyst, name: `Review plant ${Math.random()}`, currency: 'EUR' });
  return (await createCase(db, { orgId: kestrel, projectId: project.id, createdBy: analyst, content }))!;
}

const submit = (caseId: string, caseVersion = 1, inputs: object = content) =>
  db.transaction().execute((trx) =>
    submitCase(trx, {
      orgId: kestrel,
      caseId,
      allowed: (status) => checkTransition('analyst', 'submit', status),
      userId: analyst,
      caseVersion,
      frozen: { ...frozen, inputs },
      recommendation: 'Proceed (test).',
    }),
  );
const approve = (caseId: string) =>
  db
    .transaction()
    .execute((trx) => decideCase(trx, { orgId: kestrel, caseId, allowed: (status) => checkTransition('reviewer', 'approve', status), userId: reviewer }));

beforeAll(async () => {
  ({ kestrel, harrow, analyst, reviewer } = await seededDemo());
});

describe('review workflow', () => {
  it('goes draft → in review → returned → (saved: draft) → in review → approved', async () => {
    const c = await freshCase();
    expect((await submit(c.id)).ok).toBe(true);
    const returned = await db.transaction().execute((trx) =>
      decideCase(trx, {
        orgId: kestrel,
        caseId: c.id,
        allowed: (status) => checkTransition('reviewer', 'return', status),
        userId: reviewer,
        reason: 'Justify the volatility.',
      }),
    );
    expect(returned).toMatchObject({ ok: true, value: { status: 'returned', decision_reason: 'Justify the volatility.' } });
    const saved = await saveCase(db, { orgId: kestrel, caseId: c.id, expectedVersion: 1, content: { ...content, name: 'Review case, revised' } });
    expect(saved).toMatchObject({ ok: true, row: { status: 'draft', version: 2 } });
    expect((await submit(c.id, 2)).ok).toBe(true);
    expect(await approve(c.id)).toMatchObject({ ok: true, value: { status: 'approved' } });
    expect((await db.selectFrom('case').select('status').where('id', '=', c.id).executeTakeFirstOrThrow()).status).toBe('approved');
    expect(await approve(c.id)).toMatchObject({ ok: false, code: 'conflict' });
  });

  it('refuses the wrong role, a stale version, and another organisation', async () => {
    const c = await freshCase();
    expect(
      await db.transaction().execute((trx) =>
        submitCase(trx, {
          orgId: kestrel,
          caseId: c.id,
          allowed: (status) => checkTransition('reviewer', 'submit', status),
          userId: reviewer,
          caseVersion: 1,
          frozen,
          recommendation: 'Proceed (test).',
        }),
      ),
    ).toMatchObject({ ok: false, code: 'forbidden' });
    expect(await submit(c.id, 7)).toMatchObject({ ok: false, code: 'conflict' });
    expect(
      await db.transaction().execute((trx) =>
        submitCase(trx, {
          orgId: harrow,
          caseId: c.id,
          allowed: (status) => checkTransition('analyst', 'submit', status),
          userId: analyst,
          caseVersion: 1,
          frozen,
          recommendation: 'Proceed (test).',
        }),
      ),
    ).toMatchObject({
      ok: false,
      code: 'not_found',
    });
  });

  it('lets exactly one of two simultaneous approvals win', async () => {
    const c = await freshCase();
    await submit(c.id);
    const outcomes = await Promise.all([approve(c.id), approve(c.id)]);
    expect(outcomes.map((o) => o.ok).sort()).toEqual([false, true]);
    expect(outcomes.find((o) => !o.ok)).toMatchObject({ code: 'conflict' });
    const decided = await db.selectFrom('case_snapshot').select('status').where('case_id', '=', c.id).execute();
    expect(decided).toEqual([{ status: 'approved' }]);
  });

  it('keeps the first stored board pack, and answers it to a render that stored second', async () => {
    const c = await freshCase();
    await submit(c.id);
    await approve(c.id);
    const snapshot = await db.selectFrom('case_snapshot').select('id').where('case_id', '=', c.id).executeTakeFirstOrThrow();
    const first = await saveBoardPack(kestrel, snapshot.id, 'A4', Buffer.from('%PDF- first render'));
    // Another process rendered the same pack meanwhile (here with other bytes): it gets the stored one.
    const second = await saveBoardPack(kestrel, snapshot.id, 'A4', Buffer.from('%PDF- second render'));
    expect(second.pdf.toString()).toBe('%PDF- first render');
    expect(second.sha256).toBe(first.sha256);
    const stored = await db.selectFrom('board_pack').select('sha256').where('snapshot_id', '=', snapshot.id).execute();
    expect(stored).toEqual([{ sha256: first.sha256 }]);
  });

  it('keeps a snapshot byte-identical when the case is revised and edited afterwards, and refuses saves while in review or approved', async () => {
    const c = await freshCase();
    const submitted = await submit(c.id);
    if (!submitted.ok) throw new Error('not submitted');
    const bytes = () =>
      sql<{
        text: string;
      }>`select inputs::text || model::text || result::text || engine_version || input_hash as text from case_snapshot where id = ${submitted.value.id}`
        .execute(db)
        .then((r) => r.rows[0]!.text);
    const before = await bytes();
    expect(await saveCase(db, { orgId: kestrel, caseId: c.id, expectedVersion: 1, content: { ...content, name: 'Edited in review' } })).toMatchObject({
      ok: false,
      reason: 'in_review',
    });
    await approve(c.id);
    const change = { ...content, settings: { ...content.settings, volatility: 0.6 } };
    // Approved: a save is refused until a revision is started, which makes a draft at version 2.
    expect(await saveCase(db, { orgId: kestrel, caseId: c.id, expectedVersion: 1, content: change })).toMatchObject({ ok: false, reason: 'approved' });
    expect(await startRevision(db, { orgId: kestrel, caseId: c.id })).toMatchObject({ status: 'draft', version: 2 });
    expect(await startRevision(db, { orgId: kestrel, caseId: c.id })).toBeUndefined();
    const edited = await saveCase(db, { orgId: kestrel, caseId: c.id, expectedVersion: 2, content: change });
    expect(edited).toMatchObject({ ok: true, row: { status: 'draft', version: 3 } });
    expect(await bytes()).toBe(before);
  });

  it('recognises inputs approved before in engine 3.x’s shape, and only the same inputs', async () => {
    const window = { kind: 'american', from: 0, to: 4 };
    // As engine 3.x stored them (`type`, `switch`), and as migration 0016 writes the draft (key order differs too).
    const rights3x = [
      { type: 'expand', id: 'Phase 2', factor: 0.5, cost: 30, window },
      { type: 'switch', toScale: 0, cost: 1, backCost: 2, window },
    ];
    const rightsToday = [
      { kind: 'expand', id: 'Phase 2', factor: 0.5, cost: 30, window },
      { window, backCost: 2, cost: 1, toScale: 0, kind: 'mothball', id: 'switch-1' },
    ];
    const resubmit = async (options: object[]) => {
      const c = await freshCase();
      expect((await submit(c.id, 1, { ...content, options: rights3x })).ok).toBe(true);
      expect(await approve(c.id)).toMatchObject({ ok: true });
      await startRevision(db, { orgId: kestrel, caseId: c.id });
      expect((await submit(c.id, 2, { ...content, options })).ok).toBe(true);
      return (await versionChanges(kestrel, c.id))!.sameAsApproved;
    };
    expect(await resubmit(rightsToday)).toMatchObject({ caseVersion: 1 });
    expect(await resubmit([rightsToday[0]!, { ...rightsToday[1]!, backCost: 2.5 }])).toBeNull();
  });
});
