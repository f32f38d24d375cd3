/**
 * db/types.ts is kept by hand; this test holds it to the migrated schema. The table below must
 * type-check against the DB interface (every column, no extra, and `nullable` exactly where the
 * TypeScript type admits null), and must equal what PostgreSQL reports after the migrations.
 */
import { sql, type Selectable } from 'kysely';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import type { DB } from '@/db/types';

// jsonb documents are typed `unknown` (any JSON), which admits null only formally: they count as required.
type Nullability<T> = { [K in keyof T]-?: unknown extends T[K] ? 'not null' : null extends T[K] ? 'nullable' : 'not null' };
type Schema = { [Table in keyof DB]: Nullability<Selectable<DB[Table]>> };

const declared = {
  audit_log: {
    id: 'not null',
    organization_id: 'not null',
    actor_id: 'nullable',
    action: 'not null',
    subject_type: 'not null',
    subject_id: 'nullable',
    detail: 'not null',
    created_at: 'not null',
  },
  board_pack: {
    id: 'not null',
    organization_id: 'not null',
    snapshot_id: 'not null',
    page_size: 'not null',
    pdf: 'not null',
    sha256: 'not null',
    created_at: 'not null',
  },
  case: {
    id: 'not null',
    organization_id: 'not null',
    project_id: 'not null',
    name: 'not null',
    version: 'not null',
    status: 'not null',
    cash_flows: 'not null',
    settings: 'not null',
    options: 'not null',
    created_by: 'nullable',
    created_at: 'not null',
    updated_at: 'not null',
  },
  case_snapshot: {
    id: 'not null',
    organization_id: 'not null',
    case_id: 'not null',
    case_version: 'not null',
    case_name: 'not null',
    inputs: 'not null',
    model: 'not null',
    result: 'not null',
    engine_version: 'not null',
    input_hash: 'not null',
    submitted_by: 'nullable',
    submitted_at: 'not null',
    status: 'not null',
    decided_by: 'nullable',
    decided_at: 'nullable',
    decision_reason: 'nullable',
    project_name: 'nullable',
    project_description: 'nullable',
    currency: 'nullable',
    organization_name: 'nullable',
    organization_is_demo: 'nullable',
    submitted_by_name: 'nullable',
    decided_by_name: 'nullable',
    recommendation: 'nullable',
  },
  sign_in_failure: { email: 'not null', failures: 'not null', last_failure_at: 'not null' },
  invitation: {
    id: 'not null',
    organizationId: 'not null',
    email: 'not null',
    role: 'nullable',
    status: 'not null',
    expiresAt: 'not null',
    createdAt: 'not null',
    inviterId: 'not null',
  },
  member: { id: 'not null', organizationId: 'not null', userId: 'not null', role: 'not null', createdAt: 'not null' },
  organization: { id: 'not null', name: 'not null', slug: 'not null', logo: 'nullable', createdAt: 'not null', metadata: 'nullable' },
  organization_settings: {
    organization_id: 'not null',
    currency: 'not null',
    risk_free_rate: 'not null',
    wacc: 'not null',
    fiscal_year_start_month: 'not null',
    updated_at: 'not null',
    updated_by: 'nullable',
  },
  project: {
    id: 'not null',
    organization_id: 'not null',
    name: 'not null',
    description: 'not null',
    owner_id: 'nullable',
    currency: 'not null',
    status: 'not null',
    created_at: 'not null',
    updated_at: 'not null',
  },
  review_comment: {
    id: 'not null',
    organization_id: 'not null',
    case_id: 'not null',
    snapshot_id: 'nullable',
    section: 'not null',
    body: 'not null',
    author_id: 'nullable',
    created_at: 'not null',
  },
  user: { id: 'not null', name: 'not null', email: 'not null', emailVerified: 'not null', image: 'nullable', createdAt: 'not null', updatedAt: 'not null' },
  valuation_run: {
    id: 'not null',
    organization_id: 'not null',
    case_id: 'not null',
    case_version: 'not null',
    input: 'not null',
    input_hash: 'not null',
    result: 'not null',
    engine_version: 'not null',
    created_by: 'nullable',
    created_at: 'not null',
    volatility_source: 'nullable',
    result_hash: 'nullable',
  },
  volatility_simulation: {
    id: 'not null',
    organization_id: 'not null',
    case_id: 'not null',
    spec: 'not null',
    status: 'not null',
    progress: 'not null',
    result: 'nullable',
    error: 'nullable',
    created_by: 'nullable',
    created_at: 'not null',
    finished_at: 'nullable',
  },
  attachment: {
    id: 'not null',
    organization_id: 'not null',
    case_id: 'not null',
    filename: 'not null',
    kind: 'not null',
    size: 'not null',
    sha256: 'not null',
    data: 'not null',
    uploaded_by: 'nullable',
    created_at: 'not null',
  },
  portfolio_revaluation: {
    id: 'not null',
    organization_id: 'not null',
    requested_by: 'nullable',
    status: 'not null',
    total: 'nullable',
    done: 'not null',
    failed: 'not null',
    error: 'nullable',
    created_at: 'not null',
    finished_at: 'nullable',
  },
  case_observation: {
    id: 'not null',
    organization_id: 'not null',
    case_id: 'not null',
    observed_on: 'not null',
    value: 'not null',
    note: 'not null',
    source: 'not null',
    recorded_by: 'nullable',
    created_at: 'not null',
  },
  api_key: {
    id: 'not null',
    organization_id: 'not null',
    actor_id: 'not null',
    created_by: 'nullable',
    name: 'not null',
    role: 'not null',
    prefix: 'not null',
    secret_hash: 'not null',
    created_at: 'not null',
    expires_at: 'nullable',
    last_used_at: 'nullable',
    revoked_at: 'nullable',
  },
} satisfies Schema;

describe('db/types.ts', () => {
  it('declares exactly the columns and nullability of the migrated tables it covers', async () => {
    const { rows } = await sql<{ table_name: string; column_name: string; is_nullable: string }>`
      select table_name, column_name, is_nullable from information_schema.columns
      where table_schema = 'public' and table_name in (${sql.join(Object.keys(declared))})`.execute(db);
    const actual: Record<string, Record<string, string>> = {};
    for (const r of rows) (actual[r.table_name] ??= {})[r.column_name] = r.is_nullable === 'YES' ? 'nullable' : 'not null';
    expect(actual).toEqual(declared);
  });
});
