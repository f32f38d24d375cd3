/** Migrations run up, down and up again on a real PostgreSQL, and leave the expected tables. */
import { sql } from 'kysely';
import { afterAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { assertMigrated, migrator } from '@/db/migrator';

async function tables(): Promise<string[]> {
  const { rows } = await sql<{
    table_name: string;
  }>`select table_name from information_schema.tables where table_schema = 'public' and table_name not like 'kysely_%' order by table_name`.execute(db);
  return rows.map((r) => r.table_name);
}

describe('migrations', () => {
  afterAll(async () => {
    assertMigrated(await migrator(db).migrateToLatest());
  });

  it('run up, all the way down, and up again', async () => {
    const m = migrator(db);
    assertMigrated(await m.migrateToLatest());
    const up = await tables();
    expect(up).toEqual([
      'account',
      'api_key',
      'attachment',
      'audit_log',
      'board_pack',
      'case',
      'case_observation',
      'case_snapshot',
      'cross_check',
      'invitation',
      'member',
      'organization',
      'organization_settings',
      'portfolio_revaluation',
      'project',
      'rateLimit',
      'review_comment',
      'right_decision',
      'right_standing',
      'session',
      'sign_in_failure',
      'user',
      'valuation_run',
      'verification',
      'volatility_simulation',
      'watch_alert',
    ]);
    const all = await m.getMigrations();
    for (let k = 0; k < all.length; k++) assertMigrated(await m.migrateDown());
    expect(await tables()).toEqual([]);
    assertMigrated(await m.migrateToLatest());
    expect(await tables()).toEqual(up);
  });
});
