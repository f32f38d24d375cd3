/**
 * The workspace API against the real server and database: every route × every role (allowed or
 * 403), another organisation (404), no session (401); a stale save gets 409 and changes nothing;
 * bad bodies get 422 naming the field; a stored run holds exactly what valueProject computes for
 * the case's model.
 */
import type { APIRequestContext, BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { valueProject } from '@/lattice';
import { caseToModel } from '@/lib/case-model';
import { closeBrowser, newContext, signedInPage } from './support/browser';

const people = {
  admin: 'admin@kestrelbay.example',
  analyst: 'analyst@kestrelbay.example',
  reviewer: 'reviewer@kestrelbay.example',
  viewer: 'executive@kestrelbay.example',
  outsider: 'owner@harrowfen.example',
} as const;
type Who = keyof typeof people | 'anonymous';

const caseBody = {
  name: 'Base case',
  cashFlows: {
    wacc: 0.085,
    rows: [
      { year: 0, revenue: 0, operatingCost: 0, capex: 150, tax: 0, workingCapital: 0 },
      { year: 1, revenue: 90, operatingCost: 40, capex: 0, tax: 6, workingCapital: 3 },
      { year: 2, revenue: 100, operatingCost: 42, capex: 0, tax: 8, workingCapital: 1 },
      { year: 3, revenue: 105, operatingCost: 44, capex: 0, tax: 9, workingCapital: 0 },
    ],
  },
  settings: { volatility: 0.35, riskFreeRate: 0.03, steps: 60 },
  options: [
    { kind: 'expand', factor: 0.5, cost: 60, window: { kind: 'american', from: 1, to: 3 } },
    { kind: 'abandon', salvage: 70, window: { kind: 'american', from: 0, to: 3 } },
  ],
};

const contexts: BrowserContext[] = [];
const api = {} as Record<Who, APIRequestContext>;
let projectId = '';
let caseId = '';

beforeAll(async () => {
  for (const [who, email] of Object.entries(people)) {
    const { context, page } = await signedInPage(email);
    contexts.push(context);
    api[who as Who] = page.request;
  }
  const anonymous = await newContext();
  contexts.push(anonymous);
  api.anonymous = anonymous.request;
  const project = await api.analyst.post('/api/v1/projects', { data: { name: 'API test plant', description: 'Invented test project' } });
  expect(project.status()).toBe(201);
  projectId = (await project.json()).project.id;
  const made = await api.analyst.post(`/api/v1/projects/${projectId}/cases`, { data: caseBody });
  expect(made.status()).toBe(201);
  caseId = (await made.json()).case.id;
});

afterAll(async () => {
  for (const c of contexts) await c.close();
  await closeBrowser();
});

async function statusOf(who: Who, method: 'get' | 'post' | 'patch' | 'delete', url: string, data?: unknown) {
  const res = await api[who][method](url, data === undefined ? {} : { data });
  return res.status();
}

describe('workspace API by role', () => {
  it('reads: every member of the organisation 200, the other organisation 404, no session 401', async () => {
    for (const url of [
      `/api/v1/projects/${projectId}`,
      `/api/v1/projects/${projectId}/cases`,
      `/api/v1/projects/${projectId}/activity`,
      `/api/v1/cases/${caseId}`,
      `/api/v1/cases/${caseId}/valuations`,
    ]) {
      const got = Object.fromEntries(
        await Promise.all((['admin', 'analyst', 'reviewer', 'viewer', 'outsider', 'anonymous'] as Who[]).map(async (w) => [w, await statusOf(w, 'get', url)])),
      );
      expect({ url, got }).toEqual({ url, got: { admin: 200, analyst: 200, reviewer: 200, viewer: 200, outsider: 404, anonymous: 401 } });
    }
    expect(await statusOf('viewer', 'get', '/api/v1/projects')).toBe(200);
    const outsiderList = await (await api.outsider.get('/api/v1/projects')).json();
    expect(outsiderList.projects.map((p: { id: string }) => p.id)).not.toContain(projectId);
  });

  it('writes: analysts and admins allowed, reviewers and viewers 403, the other organisation 404, no session 401', async () => {
    const writes: [string, 'post' | 'patch', string, () => unknown, number][] = [
      ['create project', 'post', '/api/v1/projects', () => ({ name: 'Another' }), 201],
      ['create case', 'post', `/api/v1/projects/${projectId}/cases`, () => caseBody, 201],
      ['duplicate case', 'post', `/api/v1/cases/${caseId}/duplicate`, () => ({ name: 'Copy' }), 201],
      ['value case', 'post', `/api/v1/cases/${caseId}/valuations`, () => undefined, 201],
    ];
    for (const [name, method, url, data, created] of writes) {
      const got: Record<string, number> = {};
      for (const w of ['reviewer', 'viewer', 'anonymous', 'admin', 'analyst'] as Who[]) got[w] = await statusOf(w, method, url, data());
      const expected: Record<string, number> = { reviewer: 403, viewer: 403, anonymous: 401, admin: created, analyst: created };
      if (url !== '/api/v1/projects') {
        got.outsider = await statusOf('outsider', method, url, data());
        expected.outsider = 404;
      }
      expect({ name, got }).toEqual({ name, got: expected });
    }
  });

  it('a save based on a stale version gets 409 and changes nothing', async () => {
    const current = (await (await api.analyst.get(`/api/v1/cases/${caseId}`)).json()).case;
    const saved = await api.analyst.patch(`/api/v1/cases/${caseId}`, { data: { ...caseBody, name: 'Revised base', version: current.version } });
    expect(saved.status()).toBe(200);
    expect((await saved.json()).case.version).toBe(current.version + 1);
    const stale = await api.admin.patch(`/api/v1/cases/${caseId}`, { data: { ...caseBody, name: 'Overwritten', version: current.version } });
    expect(stale.status()).toBe(409);
    expect((await stale.json()).error.message).toContain('Nothing was overwritten');
    expect((await (await api.viewer.get(`/api/v1/cases/${caseId}`)).json()).case.name).toBe('Revised base');
    expect(await statusOf('viewer', 'patch', `/api/v1/cases/${caseId}`, { ...caseBody, version: current.version + 1 })).toBe(403);
    expect(await statusOf('outsider', 'patch', `/api/v1/cases/${caseId}`, { ...caseBody, version: current.version + 1 })).toBe(404);
  });

  it('bad bodies get 422 naming the field', async () => {
    const res = await api.analyst.post(`/api/v1/projects/${projectId}/cases`, { data: { ...caseBody, settings: { ...caseBody.settings, volatility: -1 } } });
    expect(res.status()).toBe(422);
    expect(Object.keys((await res.json()).error.fields)).toEqual(['settings.volatility']);
    const noVersion = await api.analyst.patch(`/api/v1/cases/${caseId}`, { data: caseBody });
    expect(noVersion.status()).toBe(422);
    expect(Object.keys((await noVersion.json()).error.fields)).toEqual(['version']);
  });

  it('a stored run holds exactly what valueProject computes for the case model', async () => {
    const res = await api.analyst.post(`/api/v1/cases/${caseId}/valuations`);
    expect(res.status()).toBe(201);
    const { run } = await res.json();
    const { model } = caseToModel(caseBody as never);
    expect(run.input).toEqual(JSON.parse(JSON.stringify(model)));
    expect(run.result).toEqual(JSON.parse(JSON.stringify(valueProject(model))));
    const list = (await (await api.viewer.get(`/api/v1/cases/${caseId}/valuations`)).json()).runs;
    expect(list[0].id).toBe(run.id);
    expect(list[0].expandedNpv).toBe(run.result.expandedNpv);
  });

  it('deletes: reviewers 403, the other organisation 404, analysts 204', async () => {
    const copy = (await (await api.analyst.post(`/api/v1/cases/${caseId}/duplicate`, { data: { name: 'To delete' } })).json()).case.id;
    expect(await statusOf('reviewer', 'delete', `/api/v1/cases/${copy}`)).toBe(403);
    expect(await statusOf('outsider', 'delete', `/api/v1/cases/${copy}`)).toBe(404);
    expect(await statusOf('analyst', 'delete', `/api/v1/cases/${copy}`)).toBe(204);
    expect(await statusOf('analyst', 'get', `/api/v1/cases/${copy}`)).toBe(404);
  });
});
