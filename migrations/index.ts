/**
 * The list of migrations, in order. A new migration is a new NNNN_name.ts file here plus one
 * line below (a static import works the same in tsx scripts, vitest and Next.js).
 */
import type { Migration } from 'kysely';
import * as m0001 from './0001_auth_tables';
import * as m0002 from './0002_organisation_settings_and_audit_log';
import * as m0003 from './0003_projects_cases_and_runs';
import * as m0004 from './0004_reviews_and_board_packs';
import * as m0005 from './0005_volatility_simulations';
import * as m0006 from './0006_attachments';
import * as m0007 from './0007_safe_by_default';
import * as m0008 from './0008_withdrawn_submissions';
import * as m0009 from './0009_written_recommendations';
import * as m0010 from './0010_portfolio_revaluations';
import * as m0011 from './0011_api_keys';
import * as m0012 from './0012_result_hashes';
import * as m0013 from './0013_observations';
import * as m0014 from './0014_decisions_and_alerts';
import * as m0015 from './0015_cross_checks';
import * as m0016 from './0016_right_kinds';

export const migrations: Record<string, Migration> = {
  '0001_auth_tables': m0001,
  '0002_organisation_settings_and_audit_log': m0002,
  '0003_projects_cases_and_runs': m0003,
  '0004_reviews_and_board_packs': m0004,
  '0005_volatility_simulations': m0005,
  '0006_attachments': m0006,
  '0007_safe_by_default': m0007,
  '0008_withdrawn_submissions': m0008,
  '0009_written_recommendations': m0009,
  '0010_portfolio_revaluations': m0010,
  '0011_api_keys': m0011,
  '0012_result_hashes': m0012,
  '0013_observations': m0013,
  '0014_decisions_and_alerts': m0014,
  '0015_cross_checks': m0015,
  '0016_right_kinds': m0016,
};
