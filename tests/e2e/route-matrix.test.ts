/**
 * Every API route × every role × another organisation × no session × a foreign Origin, over
 * HTTP. The table below is the specification, written from PRODUCT.md's roles (analysts build
 * and submit, reviewers comment and decide, executives read, admins run the organisation), not
 * read from lib/permissions.ts; a first test fails when a route file exists that the table
 * does not name, so a new route cannot skip this matrix.
 *
 * Nothing is changed: the wrong role is refused before any work (403); an allowed role on a
 * write is sent a body that fails validation (a 4xx that proves the role got past the check);
 * the other organisation's member takes, in turn, a role the route allows, so only the
 * organisation differs (404).
 */
import { randomUUID } from 'node:crypto';
import type { APIRequestContext, BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { createApiKey } from '@/db/queries/api-keys';
import { routeExports } from '../support/route-files';
import { closeBrowser, newContext, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

// A valid case (invented figures), sent only where the server must refuse it before reading it.
const caseBody = {
  name: 'Not yours',
  cashFlows: { wacc: 0.085, rows: [0, 1, 2].map((year) => ({ year, revenue: 90, operatingCost: 40, capex: year === 0 ? 150 : 0, tax: 6, workingCapital: 0 })) },
  settings: { volatility: 0.35, riskFreeRate: 0.03, steps: 30 },
  options: [],
};

type Role = 'admin' | 'analyst' | 'reviewer' | 'viewer';
type Method = 'GET' | 'POST' | 'PATCH' | 'DELETE';
const ALL: Role[] = ['admin', 'analyst', 'reviewer', 'viewer'];
const BUILDERS: Role[] = ['admin', 'analyst'];

/**
 * [method, path with :placeholders, roles allowed, probe]. The probe is what an allowed role
 * sends to a write: a body that fails validation, and the status expected for it; `valid` is a
 * body that passes validation, sent only by the other organisation (JSON bodies are validated
 * before the record is looked up, so only a valid one reaches the lookup). Writes with
 * no probe (a delete, a submission, an approval, a valuation that is stored) are exercised by
 * the allowed role in their own tests (workspace-api, review-workflow, attachments, monte-carlo,
 * withdraw).
 */
type Probe = { json?: unknown; text?: string; status: number; valid?: unknown };
const matrix: [Method, string, Role[], Probe?][] = [
  ['GET', '/api/v1/projects', ALL],
  ['POST', '/api/v1/projects', BUILDERS, { json: { name: 5 }, status: 422 }],
  ['GET', '/api/v1/projects/:project', ALL],
  ['PATCH', '/api/v1/projects/:project', BUILDERS, { json: { name: 5 }, status: 422, valid: { name: 'Taken' } }],
  ['DELETE', '/api/v1/projects/:project', BUILDERS],
  ['GET', '/api/v1/projects/:project/activity', ALL],
  ['GET', '/api/v1/projects/:project/cases', ALL],
  ['POST', '/api/v1/projects/:project/cases', BUILDERS, { json: { name: 5 }, status: 422, valid: caseBody }],
  ['GET', '/api/v1/cases', ALL],
  ['GET', '/api/v1/cases/:case', ALL],
  ['PATCH', '/api/v1/cases/:case', BUILDERS, { json: { name: 5 }, status: 422, valid: { ...caseBody, version: 1 } }],
  ['DELETE', '/api/v1/cases/:case', BUILDERS],
  ['GET', '/api/v1/cases/:case/export.xlsx', ALL],
  ['GET', '/api/v1/cases/:case/snapshots', ALL],
  ['POST', '/api/v1/cases/:case/cash-flows/import', BUILDERS, { text: 'not a workbook', status: 415 }],
  ['POST', '/api/v1/cases/:case/submit', ['analyst'], { json: { recommendation: '' }, status: 422, valid: { recommendation: 'Not yours.' } }],
  ['POST', '/api/v1/cases/:case/duplicate', BUILDERS, { json: { name: 5 }, status: 422, valid: { name: 'Copy' } }],
  ['POST', '/api/v1/cases/:case/approve', ['reviewer']],
  ['POST', '/api/v1/cases/:case/withdraw', ['analyst']],
  ['POST', '/api/v1/cases/:case/revisions', BUILDERS],
  ['POST', '/api/v1/cases/:case/return', ['reviewer'], { json: { reason: 5 }, status: 422, valid: { reason: 'Not yours to return.' } }],
  ['GET', '/api/v1/cases/:case/board-pack', ALL],
  ['GET', '/api/v1/cases/:case/validation-report', ALL],
  ['GET', '/api/v1/cases/:case/validation-report.xlsx', ALL],
  ['POST', '/api/v1/cases/:case/validation-report/attachments', ['admin', 'analyst', 'reviewer']],
  ['GET', '/api/v1/cases/:case/watch', ALL],
  ['POST', '/api/v1/cases/:case/observations/import', BUILDERS, { text: 'not multipart', status: 415 }],
  ['POST', '/api/v1/cases/:case/observations', BUILDERS, { json: { date: 5 }, status: 422, valid: { date: '2026-12-01', value: 100 } }],
  [
    'POST',
    '/api/v1/cases/:case/rights/:right/decisions',
    BUILDERS,
    { json: { decision: 'used' }, status: 422, valid: { decision: 'postponed', reason: 'Not yours to decide.' } },
  ],
  ['POST', '/api/v1/cases/:case/valuations', BUILDERS],
  ['GET', '/api/v1/cases/:case/valuations', ALL],
  ['POST', '/api/v1/cases/:case/valuations/:run/rerun', ['admin', 'analyst', 'reviewer']],
  ['POST', '/api/v1/cases/:case/cross-checks', ['admin', 'analyst', 'reviewer'], { json: { paths: 5 }, status: 422, valid: { paths: 1000, seed: 1 } }],
  ['GET', '/api/v1/cases/:case/cross-checks', ALL],
  ['GET', '/api/v1/cases/:case/cross-checks/:crossCheck', ALL],
  ['DELETE', '/api/v1/cases/:case/cross-checks/:crossCheck', ['admin', 'analyst', 'reviewer']],
  ['GET', '/api/v1/cases/:case/attachments', ALL],
  ['POST', '/api/v1/cases/:case/attachments', BUILDERS, { text: 'not multipart', status: 415 }],
  ['GET', '/api/v1/cases/:case/comments', ALL],
  ['POST', '/api/v1/cases/:case/comments', ['admin', 'analyst', 'reviewer'], { json: { body: 5 }, status: 422, valid: { section: 'general', body: 'Hello' } }],
  ['GET', '/api/v1/reviews', ['admin', 'analyst', 'reviewer']],
  ['GET', '/api/v1/templates/cash-flows.xlsx', ALL],
  ['GET', '/api/v1/settings', ALL],
  ['PATCH', '/api/v1/settings', ['admin'], { json: { currency: 5 }, status: 422 }],
  ['GET', '/api/v1/compare?cases=:case,:secondCase', ALL],
  ['GET', '/api/v1/compare.xlsx?cases=:case,:secondCase', ALL],
  ['POST', '/api/v1/valuations', ALL, { json: { project: 5 }, status: 422 }],
  ['GET', '/api/v1/attachments/:attachment', ALL],
  ['DELETE', '/api/v1/attachments/:attachment', BUILDERS],
  ['POST', '/api/v1/volatility/history', BUILDERS, { text: 'not multipart', status: 415 }],
  ['POST', '/api/v1/volatility/simulations', BUILDERS, { json: { caseId: 5 }, status: 422 }],
  ['GET', '/api/v1/volatility/simulations/:simulation', ALL],
  ['DELETE', '/api/v1/volatility/simulations/:simulation', BUILDERS],
  ['GET', '/api/v1/organisations/:organisation/settings', ALL],
  ['POST', '/api/v1/portfolio/revaluations', BUILDERS],
  ['GET', '/api/v1/portfolio/revaluations/:revaluation', ALL],
  ['GET', '/api/v1/portfolio.csv', ALL],
  ['GET', '/api/v1/portfolio.xlsx', ALL],
  ['GET', '/api/v1/openapi.json', ALL],
  ['GET', '/api/v1/api-keys', ['admin']],
  ['POST', '/api/v1/api-keys', ['admin'], { json: { name: 5 }, status: 422 }],
  ['DELETE', '/api/v1/api-keys/:apiKey', ['admin']],
];

const emails: Record<Role, string> = {
  admin: 'admin@kestrelbay.example',
  analyst: 'analyst@kestrelbay.example',
  reviewer: 'reviewer@kestrelbay.example',
  viewer: 'executive@kestrelbay.example',
};

const contexts: BrowserContext[] = [];
const as = {} as Record<Role | 'outsider' | 'anonymous', APIRequestContext>;
const ids: Record<string, string> = {};
let outsiderMemberId = '';

/** The route files on disk, as "METHOD /api/v1/…" with each [param] written :param. */
const routesOnDisk = () =>
  routeExports()
    .map((r) => `${r.method} ${r.url.replace(/\[(\w+)\]/g, ':$1')}`)
    .sort();

/** The matrix's path written the way the route files name their parameters. */
const filePlaceholders: Record<string, string> = {
  project: 'projectId',
  case: 'caseId',
  attachment: 'attachmentId',
  simulation: 'simulationId',
  organisation: 'orgId',
  revaluation: 'revaluationId',
  apiKey: 'keyId',
  run: 'runId',
  right: 'rightId',
  crossCheck: 'crossCheckId',
};

const fill = (path: string) => path.replace(/:(\w+)/g, (_, key: string) => ids[key]!);

async function send(who: APIRequestContext, method: Method, path: string, probe?: Probe, headers: Record<string, string> = {}) {
  const body =
    probe?.json !== undefined
      ? { data: probe.json }
      : probe?.text !== undefined
        ? { data: probe.text, headers: { 'content-type': 'text/plain', ...headers } }
        : {};
  return who.fetch(fill(path), { method, headers, ...body, timeout: 60_000 });
}

beforeAll(async () => {
  for (const role of ALL) {
    const signed = await signedInPage(emails[role]);
    contexts.push(signed.context);
    as[role] = signed.page.request;
  }
  const outsider = await signedInPage('owner@harrowfen.example');
  contexts.push(outsider.context);
  as.outsider = outsider.page.request;
  const anonymous = await newContext();
  contexts.push(anonymous);
  as.anonymous = anonymous.request;

  // The approved demo case, so its board pack exists; an attachment, a finished simulation and a cross-check on it, and a finished re-valuation.
  const approved = await demoCase('Phased bio-resin plant', 'Base case');
  ids.case = approved.caseId;
  ids.right = encodeURIComponent('Phase 2');
  ids.project = approved.projectId;
  ids.secondCase = (await demoCase('Phased bio-resin plant', 'Volatile demand')).caseId;
  const org = await db.selectFrom('organization').select('id').where('slug', '=', 'kestrel-bay-materials').executeTakeFirstOrThrow();
  ids.organisation = org.id;
  const data = Buffer.from('date,value\n2026-01-01,1\n');
  ids.attachment = (
    await db
      .insertInto('attachment')
      .values({
        id: randomUUID(),
        organization_id: org.id,
        case_id: ids.case,
        filename: 'matrix.csv',
        kind: 'csv',
        size: data.length,
        sha256: 'matrix',
        data,
        uploaded_by: null,
      })
      .returning('id')
      .executeTakeFirstOrThrow()
  ).id;
  ids.simulation = (
    await db
      .insertInto('volatility_simulation')
      .values({
        organization_id: org.id,
        case_id: ids.case,
        spec: JSON.stringify({}),
        status: 'cancelled',
        created_at: new Date(),
        finished_at: new Date(),
        error: null,
        created_by: null,
      })
      .returning('id')
      .executeTakeFirstOrThrow()
  ).id;
  ids.crossCheck = (
    await db
      .insertInto('cross_check')
      .values({
        organization_id: org.id,
        case_id: ids.case,
        case_version: 1,
        engine_version: 'matrix',
        model: JSON.stringify({}),
        paths: 1000,
        seed: 1,
        status: 'cancelled',
        finished_at: new Date(),
        error: null,
        created_by: null,
      })
      .returning('id')
      .executeTakeFirstOrThrow()
  ).id;
  ids.revaluation = (
    await db
      .insertInto('portfolio_revaluation')
      .values({ organization_id: org.id, status: 'done', total: 0, finished_at: new Date() })
      .returning('id')
      .executeTakeFirstOrThrow()
  ).id;
  ids.run = (await db.selectFrom('valuation_run').select('id').where('case_id', '=', ids.case).orderBy('created_at', 'desc').executeTakeFirstOrThrow()).id;
  const admin = await db.selectFrom('user').select(['id', 'name']).where('email', '=', emails.admin).executeTakeFirstOrThrow();
  ids.apiKey = (
    await createApiKey(db, {
      orgId: org.id,
      createdBy: admin.id,
      creatorName: admin.name,
      name: 'Matrix key',
      role: 'viewer',
      prefix: 'lwk_matrix00',
      secretHash: `matrix-${randomUUID()}`,
      expiresAt: null,
    })
  ).id;
  outsiderMemberId = (
    await db
      .selectFrom('member')
      .innerJoin('user', 'user.id', 'member.userId')
      .select('member.id')
      .where('user.email', '=', 'owner@harrowfen.example')
      .executeTakeFirstOrThrow()
  ).id;
});

afterAll(async () => {
  await db.deleteFrom('attachment').where('id', '=', ids.attachment!).execute();
  await db.deleteFrom('volatility_simulation').where('id', '=', ids.simulation!).execute();
  await db.deleteFrom('cross_check').where('id', '=', ids.crossCheck!).execute();
  await db.deleteFrom('portfolio_revaluation').where('id', '=', ids.revaluation!).execute();
  await db
    .deleteFrom('user')
    .where('id', '=', (await db.selectFrom('api_key').select('actor_id').where('id', '=', ids.apiKey!).executeTakeFirstOrThrow()).actor_id)
    .execute();
  await db.updateTable('member').set({ role: 'admin' }).where('id', '=', outsiderMemberId).execute();
  for (const c of contexts) await c.close();
  await closeBrowser();
  await db.destroy();
});

describe('the route × role × organisation matrix', () => {
  it('names every route file under app/api/v1', () => {
    const named = matrix.map(([method, path]) => `${method} ${path.split('?')[0]!.replace(/:(\w+)/g, (_, key: string) => `:${filePlaceholders[key]}`)}`).sort();
    expect(named).toEqual(routesOnDisk());
  });

  it('answers 401 to every route without a session', async () => {
    const got: Record<string, number> = {};
    for (const [method, path, , probe] of matrix) got[`${method} ${path}`] = (await send(as.anonymous, method, path, probe)).status();
    expect(Object.entries(got).filter(([, status]) => status !== 401)).toEqual([]);
  });

  it('answers 403 to every write from a foreign Origin, even for an allowed role', async () => {
    const got: Record<string, number> = {};
    for (const [method, path, allowed, probe] of matrix) {
      if (method === 'GET') continue;
      got[`${method} ${path}`] = (await send(as[allowed[0]!], method, path, probe, { origin: 'http://127.0.0.1:9' })).status();
    }
    expect(Object.entries(got).filter(([, status]) => status !== 403)).toEqual([]);
  });

  it('refuses every role the route does not allow with 403, and lets every allowed role past the check', async () => {
    const wrong: string[] = [];
    for (const [method, path, allowed, probe] of matrix) {
      for (const role of ALL) {
        const isAllowed = allowed.includes(role);
        if (isAllowed && method !== 'GET' && !probe) continue;
        const status = (await send(as[role], method, path, probe)).status();
        const expected = !isAllowed ? 403 : method === 'GET' ? 200 : probe!.status;
        if (status !== expected) wrong.push(`${role} ${method} ${path}: ${status}, expected ${expected}`);
      }
    }
    expect(wrong).toEqual([]);
  });

  it("answers 404 to another organisation's member holding a role the route allows, on every route that names a record", async () => {
    const wrong: string[] = [];
    for (const [method, path, allowed, probe] of matrix) {
      if (!path.includes(':')) continue;
      await db.updateTable('member').set({ role: allowed[0]! }).where('id', '=', outsiderMemberId).execute();
      const body = probe?.valid !== undefined ? { ...probe, json: probe.valid } : probe;
      const status = (await send(as.outsider, method, path, body)).status();
      if (status !== 404) wrong.push(`${allowed[0]} ${method} ${path}: ${status}`);
    }
    expect(wrong).toEqual([]);
  });
});
