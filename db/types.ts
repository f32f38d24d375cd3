/**
 * The database as Kysely sees it, kept by hand and checked against the migrated schema by
 * tests/db/schema-types.test.ts. Nullable columns are `T | null`, never optional.
 */
import type { ColumnType, Generated, Insertable, Selectable, Updateable } from 'kysely';

type Timestamp = ColumnType<Date, Date | string | undefined, Date | string>;

export interface UserTable {
  id: string;
  name: string;
  email: string;
  emailVerified: boolean;
  image: string | null;
  createdAt: Timestamp;
  updatedAt: Timestamp;
}

export interface OrganizationTable {
  id: string;
  name: string;
  slug: string;
  logo: string | null;
  createdAt: Timestamp;
  metadata: string | null;
}

export interface MemberTable {
  id: string;
  organizationId: string;
  userId: string;
  role: string;
  createdAt: Timestamp;
}

export interface InvitationTable {
  id: string;
  organizationId: string;
  email: string;
  role: string | null;
  status: string;
  expiresAt: Timestamp;
  createdAt: Timestamp;
  inviterId: string;
}

export interface OrganizationSettingsTable {
  organization_id: string;
  currency: Generated<string>;
  risk_free_rate: Generated<number>;
  wacc: Generated<number>;
  fiscal_year_start_month: Generated<number>;
  /** How many days before a followed right's window closes its alert goes out. */
  alert_days_before_close: Generated<number>;
  updated_at: Timestamp;
  updated_by: string | null;
}

export interface AuditLogTable {
  id: Generated<string>;
  organization_id: string;
  actor_id: string | null;
  action: string;
  subject_type: string;
  subject_id: string | null;
  detail: ColumnType<Record<string, unknown>, Record<string, unknown> | undefined, Record<string, unknown>>;
  created_at: Timestamp;
}

export interface ProjectTable {
  id: Generated<string>;
  organization_id: string;
  name: string;
  description: Generated<string>;
  owner_id: string | null;
  currency: string;
  status: Generated<'active' | 'archived'>;
  created_at: Timestamp;
  updated_at: Timestamp;
}

/** jsonb: read as parsed JSON; written as JSON text (pg would turn a JS array into a PostgreSQL array). */
type Json<T> = ColumnType<T, string, string>;

export interface CaseTable {
  id: Generated<string>;
  organization_id: string;
  project_id: string;
  name: string;
  version: Generated<number>;
  status: Generated<CaseStatus>;
  cash_flows: Json<unknown>;
  settings: Json<unknown>;
  options: Json<unknown[]>;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface ValuationRunTable {
  id: Generated<string>;
  organization_id: string;
  case_id: string;
  case_version: number;
  input: Json<unknown>;
  input_hash: string;
  result: Json<unknown>;
  engine_version: string;
  created_by: string | null;
  created_at: Timestamp;
  /** How the case's volatility was obtained when it was valued (null before this was recorded). */
  volatility_source: ColumnType<{ method: string; note: string } | null, string | null | undefined, string | null>;
  /** SHA-256 of the result in canonical JSON (lib/model-hash.ts); null for runs stored before it was kept. */
  result_hash: ColumnType<string | null, string | null | undefined, never>;
}

export type CaseStatus = 'draft' | 'in_review' | 'approved' | 'returned';
export type SnapshotStatus = 'in_review' | 'approved' | 'returned' | 'withdrawn';

export interface CaseSnapshotTable {
  id: Generated<string>;
  organization_id: string;
  case_id: string;
  case_version: number;
  case_name: string;
  inputs: Json<unknown>;
  model: Json<unknown>;
  result: Json<unknown>;
  engine_version: string;
  input_hash: string;
  submitted_by: string | null;
  submitted_at: Timestamp;
  status: Generated<SnapshotStatus>;
  decided_by: string | null;
  decided_at: Date | null;
  decision_reason: string | null;
  /** Names as they were at submission (and the decider's at the decision): what the board pack prints. */
  project_name: string | null;
  project_description: string | null;
  currency: string | null;
  organization_name: string | null;
  organization_is_demo: boolean | null;
  submitted_by_name: string | null;
  decided_by_name: string | null;
  /** The analyst's recommendation to the committee, written at submission (null before migration 0009). */
  recommendation: Generated<string | null>;
}

/** Consecutive failed sign-ins per e-mail address (lib/sign-in-backoff.ts). */
export interface SignInFailureTable {
  email: string;
  failures: number;
  last_failure_at: Timestamp;
}

export interface ReviewCommentTable {
  id: Generated<string>;
  organization_id: string;
  case_id: string;
  snapshot_id: string | null;
  section: string;
  body: string;
  author_id: string | null;
  created_at: Timestamp;
}

export interface BoardPackTable {
  id: Generated<string>;
  organization_id: string;
  snapshot_id: string;
  page_size: 'A4' | 'LETTER';
  pdf: Buffer;
  sha256: string;
  created_at: Timestamp;
}

export interface VolatilitySimulationTable {
  id: Generated<string>;
  organization_id: string;
  case_id: string;
  spec: Json<unknown>;
  status: Generated<'running' | 'done' | 'cancelled' | 'failed'>;
  progress: Generated<number>;
  result: ColumnType<Record<string, unknown> | null, string | null | undefined, string | null>;
  error: string | null;
  created_by: string | null;
  created_at: Timestamp;
  finished_at: Date | null;
}

/** An independent Monte Carlo of a case version's model, run as a job (migrations/0015). */
export interface CrossCheckTable {
  id: Generated<string>;
  organization_id: string;
  case_id: string;
  case_version: number;
  engine_version: string;
  model: Json<unknown>;
  paths: number;
  seed: number;
  status: Generated<'running' | 'done' | 'cancelled' | 'failed'>;
  progress: Generated<number>;
  result: ColumnType<Record<string, unknown> | null, string | null | undefined, string | null>;
  error: string | null;
  created_by: string | null;
  created_at: Timestamp;
  finished_at: Date | null;
}

export interface AttachmentTable {
  id: Generated<string>;
  organization_id: string;
  case_id: string;
  filename: string;
  kind: 'pdf' | 'xlsx' | 'csv' | 'png';
  size: number;
  sha256: string;
  data: Buffer;
  uploaded_by: string | null;
  created_at: Timestamp;
}

export interface DB {
  user: UserTable;
  organization: OrganizationTable;
  member: MemberTable;
  invitation: InvitationTable;
  organization_settings: OrganizationSettingsTable;
  audit_log: AuditLogTable;
  project: ProjectTable;
  case: CaseTable;
  valuation_run: ValuationRunTable;
  case_snapshot: CaseSnapshotTable;
  review_comment: ReviewCommentTable;
  board_pack: BoardPackTable;
  volatility_simulation: VolatilitySimulationTable;
  attachment: AttachmentTable;
  sign_in_failure: SignInFailureTable;
  portfolio_revaluation: PortfolioRevaluationTable;
  api_key: ApiKeyTable;
  case_observation: CaseObservationTable;
  right_decision: RightDecisionTable;
  right_standing: RightStandingTable;
  watch_alert: WatchAlertTable;
  cross_check: CrossCheckTable;
}

/** A request to re-value every case whose stored figures come from an older engine (a job). */
export interface PortfolioRevaluationTable {
  id: Generated<string>;
  organization_id: string;
  requested_by: string | null;
  status: Generated<'running' | 'done' | 'failed'>;
  /** Cases taken; null until the worker has listed them. */
  total: number | null;
  done: Generated<number>;
  failed: Generated<number>;
  error: string | null;
  created_at: Generated<Timestamp>;
  finished_at: Timestamp | null;
}

/** An organisation API key: its secret is kept only as a SHA-256 hash; it acts through its own user row. */
export interface ApiKeyTable {
  id: Generated<string>;
  organization_id: string;
  /** The user row the key acts as (no password, no membership). */
  actor_id: string;
  created_by: string | null;
  name: string;
  role: 'analyst' | 'reviewer' | 'viewer';
  /** The first characters of the key, shown so people can tell keys apart. */
  prefix: string;
  secret_hash: string;
  created_at: Timestamp;
  expires_at: Timestamp | null;
  last_used_at: Timestamp | null;
  revoked_at: Timestamp | null;
}

/** A dated observation of a followed case's project value V (after its approval). */
export interface CaseObservationTable {
  id: Generated<string>;
  organization_id: string;
  case_id: string;
  /** A calendar date, YYYY-MM-DD (db/queries/observations.ts reads it as text, never as a Date at local midnight). */
  observed_on: ColumnType<string, string, string>;
  value: number;
  note: Generated<string>;
  source: Generated<string>;
  recorded_by: string | null;
  created_at: Timestamp;
}

export type RightDecisionKind = 'exercised' | 'declined' | 'postponed';

/** A decision recorded on a right of an approved version: used, given up, or not now. */
export interface RightDecisionTable {
  id: Generated<string>;
  organization_id: string;
  case_id: string;
  snapshot_id: string;
  right_id: string;
  decision: RightDecisionKind;
  /** A calendar date, YYYY-MM-DD (read as text, like observed_on). */
  decided_on: ColumnType<string, string, string>;
  reason: string;
  recorded_by: string | null;
  created_at: Timestamp;
}

/** The last standing seen for a followed right: a change from it is what an alert announces. */
export interface RightStandingTable {
  snapshot_id: string;
  right_id: string;
  status: string;
  as_of: ColumnType<string, string, string>;
  updated_at: Timestamp;
}

export type WatchAlertKind = 'in_region' | 'near' | 'window_opened' | 'window_closing';

/** One change in a followed right's standing, announced once (mail and the notifications page). */
export interface WatchAlertTable {
  id: Generated<string>;
  organization_id: string;
  case_id: string;
  snapshot_id: string;
  right_id: string;
  kind: WatchAlertKind;
  change_key: string;
  message: string;
  as_of: ColumnType<string, string, string>;
  created_at: Timestamp;
}

export type OrganizationSettings = Selectable<OrganizationSettingsTable>;
export type OrganizationSettingsUpdate = Updateable<OrganizationSettingsTable>;
export type AuditLogEntry = Selectable<AuditLogTable>;
export type NewAuditLogEntry = Insertable<AuditLogTable>;
export type Member = Selectable<MemberTable>;
export type Project = Selectable<ProjectTable>;
export type Case = Selectable<CaseTable>;
export type ValuationRun = Selectable<ValuationRunTable>;
export type CaseSnapshot = Selectable<CaseSnapshotTable>;
export type ReviewComment = Selectable<ReviewCommentTable>;
