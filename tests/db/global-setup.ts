/**
 * A fresh test database for every run: drops and recreates $PG_TEST_DATABASE (default
 * leeway_test) on the project-local cluster, or uses TEST_DATABASE_URL as given; then installs
 * the job queues, as `npm run migrate` does (the demo seed and the services put jobs on them).
 */
import pg from 'pg';
import { databaseUrl } from '../../db/url';
import { installQueues } from '../../lib/jobs/install';

export default async function setup() {
  if (process.env.TEST_DATABASE_URL) return installQueues(process.env.TEST_DATABASE_URL);
  const name = process.env.PG_TEST_DATABASE ?? 'leeway_test';
  const admin = new pg.Client({ connectionString: databaseUrl('postgres') });
  await admin.connect();
  await admin.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
  await admin.query(`CREATE DATABASE ${name}`);
  await admin.end();
  await installQueues(databaseUrl(name));
}
