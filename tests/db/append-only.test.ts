/**
 * The approval record is append-only in the database itself (migration 0007), not only in the
 * app: the app's own database role cannot rewrite or remove audit entries or snapshots, a
 * snapshot takes exactly one decision, and nobody decides on their own submission.
 */
import { checkTransition } from '@/lib/review/transitions';
import { sql } from 'kysely';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { decideCase, submitCase } from '@/db/queries/reviews';
import { createCase } from '@/db/queries/cases';
import { createProject } from '@/db/queries/projects';
import { minimalCase, seededDemo } from './support/demo';

describe('append-only records', () => {
  it('refuse updates and deletes of audit entries', async () => {
    const { kestrel, analyst } = await seededDemo();
    await recordAudit(db, { orgId: kestrel, actorId: analyst, action: 'test.append_only', subjectType: 'test' });
    await expect(sql`update audit_log set action = 'rewritten' where action = 'test.append_only'`.execute(db)).rejects.toThrow(/append-only/);
    await expect(sql`delete from audit_log where action = 'test.append_only'`.execute(db)).rejects.toThrow(/append-only/);
  });

  it('let a snapshot take one decision, by someone other than its submitter, and nothing after', async () => {
    const { kestrel, analyst, reviewer } = await seededDemo();
    const project = await createProject(db, { orgId: kestrel, ownerId: analyst, name: `Append-only plant ${Math.random()}`, currency: 'EUR' });
    const c = (await createCase(db, { orgId: kestrel, projectId: project.id, createdBy: analyst, content: minimalCase }))!;
    const frozen = { inputs: {}, model: {}, result: { expandedNpv: 1 }, engineVersion: 'test', inputHash: 'h' };
    const submitted = await db.transaction().execute((trx) =>
      submitCase(trx, {
        orgId: kestrel,
        caseId: c.id,
        allowed: (status) => checkTransition('analyst', 'submit', status),
        userId: analyst,
        caseVersion: c.version,
        frozen,
        recommendation: 'Proceed (test).',
      }),
    );
    expect(submitted.ok).toBe(true);
    if (!submitted.ok) return;
    expect(submitted.value.project_name).toBeTruthy();
    // The submitter, even holding a reviewer's role, cannot decide.
    const own = await db
      .transaction()
      .execute((trx) => decideCase(trx, { orgId: kestrel, caseId: c.id, allowed: (status) => checkTransition('admin', 'approve', status), userId: analyst }));
    expect(own).toMatchObject({ ok: false, code: 'forbidden' });
    // Nor by writing the row directly: the database's own constraint refuses it.
    await expect(sql`update case_snapshot set status = 'approved', decided_by = submitted_by where id = ${submitted.value.id}`.execute(db)).rejects.toThrow(
      /four_eyes/,
    );
    // Frozen columns never change, even while in review.
    await expect(sql`update case_snapshot set result = '{"expandedNpv": 99}' where id = ${submitted.value.id}`.execute(db)).rejects.toThrow(/frozen/);
    // Nor may a decision rewrite the analyst's recommendation on the way (migration 0009).
    await expect(
      sql`update case_snapshot set status = 'returned', recommendation = 'Something else' where id = ${submitted.value.id}`.execute(db),
    ).rejects.toThrow(/frozen/);
    const decided = await db
      .transaction()
      .execute((trx) =>
        decideCase(trx, { orgId: kestrel, caseId: c.id, allowed: (status) => checkTransition('reviewer', 'approve', status), userId: reviewer }),
      );
    expect(decided.ok).toBe(true);
    await expect(
      sql`update case_snapshot set status = 'returned', decision_reason = 'changed my mind' where id = ${submitted.value.id}`.execute(db),
    ).rejects.toThrow(/frozen/);
    await expect(sql`update case_snapshot set decided_by_name = 'Someone else' where id = ${submitted.value.id}`.execute(db)).rejects.toThrow(/frozen/);
    await expect(sql`delete from case_snapshot where id = ${submitted.value.id}`.execute(db)).rejects.toThrow(/append-only/);
  });
});
