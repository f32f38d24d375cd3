/**
 * The API as a product (issue 14), through a typed client only: openapi-fetch with the types
 * openapi-typescript generates from the OpenAPI document (types/leeway-api.d.ts). An analyst's
 * key does the analyst's whole job — a project, a case, its cash flows and rights, a valuation,
 * the workbook, the submission — a reviewer's key approves it and a viewer's key downloads the
 * board pack. Then every other operation is called once. Every answer is checked against the
 * document (tests/e2e/support/api-conformance.ts), and the test ends by proving that every
 * operation of the document answered 2xx at least once, so the document cannot drift from the
 * code unnoticed.
 */
import createClient, { type Client } from 'openapi-fetch';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { operations } from '@/lib/openapi/operations';
import type { paths } from '@/types/leeway-api';
import { closeBrowser, signedInPage } from './support/browser';
import { Conformance } from './support/api-conformance';
import { BASE_URL } from './support/env';

let conformance: Conformance;
type Api = Client<paths>;
let admin: Api;
const keys = {} as Record<'analyst' | 'reviewer' | 'viewer', Api>;

function client(headers: Record<string, string>): Api {
  const api = createClient<paths>({ baseUrl: BASE_URL, headers });
  api.use(conformance.middleware());
  return api;
}

/** The answer's data, or the test fails with the server's error message. */
function ok<T>(answer: { data?: T; error?: unknown; response: Response }): T {
  if (answer.data === undefined || !answer.response.ok) throw new Error(`${answer.response.status} ${answer.response.url}: ${JSON.stringify(answer.error)}`);
  return answer.data;
}

const multipart = { bodySerializer: (body: unknown) => body as FormData };

beforeAll(async () => {
  const signed = await signedInPage('admin@kestrelbay.example');
  const cookie = (await signed.context.cookies()).map((c) => `${c.name}=${c.value}`).join('; ');
  const plain = await fetch(`${BASE_URL}/api/v1/openapi.json`, { headers: { cookie } });
  conformance = new Conformance(await plain.json());
  // The admin works from the app (a session cookie and the app's Origin); everyone else with a key.
  admin = client({ cookie, origin: BASE_URL });
  for (const role of ['analyst', 'reviewer', 'viewer'] as const) {
    const made = ok(await admin.POST('/api/v1/api-keys', { body: { name: `Typed client ${role} ${Date.now().toString(36)}`, role, expiresInDays: 1 } }));
    keys[role] = client({ authorization: `Bearer ${made.key}` });
  }
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('the API through its typed client', () => {
  const ids = {} as Record<'project' | 'case' | 'other', string>;

  it("does the analyst's job with keys only: build, value, export, submit; a reviewer key approves; a viewer key downloads the board pack", async () => {
    const { analyst, reviewer, viewer } = keys;
    ids.project = ok(
      await analyst.POST('/api/v1/projects', { body: { name: `Typed cold store ${Date.now().toString(36)}`, description: 'Invented for a test' } }),
    ).project.id;
    const rows = [0, 1, 2, 3, 4].map((year) => ({
      year,
      revenue: year ? 70 : 0,
      operatingCost: year ? 30 : 0,
      capex: year ? 0 : 100,
      tax: year ? 6 : 0,
      workingCapital: 0,
    }));
    const made = ok(
      await analyst.POST('/api/v1/projects/{projectId}/cases', {
        params: { path: { projectId: ids.project } },
        body: { name: 'Base case', cashFlows: { wacc: 0.09, rows }, settings: { volatility: 0.3, riskFreeRate: 0.03, steps: 40 }, options: [] },
      }),
    ).case;
    ids.case = made.id;
    const saved = ok(
      await analyst.PATCH('/api/v1/cases/{caseId}', {
        params: { path: { caseId: made.id } },
        body: {
          name: made.name,
          version: made.version,
          cashFlows: { ...made.cashFlows, rows: rows.map((r) => (r.year === 4 ? { ...r, revenue: 80 } : r)) },
          settings: made.settings,
          options: [{ kind: 'expand', id: 'Second line', factor: 0.4, cost: 35, window: { kind: 'american', from: 1, to: 3 } }],
        },
      }),
    ).case;
    expect(saved.version).toBe(made.version + 1);
    const run = ok(await analyst.POST('/api/v1/cases/{caseId}/valuations', { params: { path: { caseId: made.id } } })).run;
    expect(run.result.expandedNpv).toBeGreaterThanOrEqual(run.result.staticNpv);
    const workbook = await analyst.GET('/api/v1/cases/{caseId}/export.xlsx', { params: { path: { caseId: made.id } }, parseAs: 'arrayBuffer' });
    expect(Buffer.from(ok(workbook)).subarray(0, 2).toString()).toBe('PK');
    const snapshot = ok(
      await analyst.POST('/api/v1/cases/{caseId}/submit', {
        params: { path: { caseId: made.id } },
        body: { recommendation: 'Build it; keep the second line open.' },
      }),
    ).snapshot;
    expect(snapshot.status).toBe('in_review');

    expect(ok(await reviewer.GET('/api/v1/reviews', {})).cases.some((c) => c.caseId === made.id)).toBe(true);
    expect(ok(await reviewer.POST('/api/v1/cases/{caseId}/approve', { params: { path: { caseId: made.id } } })).snapshot.status).toBe('approved');
    const pack = await viewer.GET('/api/v1/cases/{caseId}/board-pack', {
      params: { path: { caseId: made.id }, query: { size: 'A4' } },
      parseAs: 'arrayBuffer',
    });
    expect(Buffer.from(ok(pack)).subarray(0, 5).toString()).toBe('%PDF-');
    // Follow-through: the analyst's key records today's value; the viewer's key reads where each right stands.
    const today = new Date().toISOString().slice(0, 10);
    ok(
      await analyst.POST('/api/v1/cases/{caseId}/observations', {
        params: { path: { caseId: made.id } },
        body: { date: today, value: 120, source: 'updated DCF' },
      }),
    );
    const watch = ok(await viewer.GET('/api/v1/cases/{caseId}/watch', { params: { path: { caseId: made.id } } }));
    expect(watch.asOf).toBe(today);
    expect(watch.rights.map((r) => r.name)).toEqual(['Second line']);
    // The analyst's key records a decision on it; the viewer's key reads it back.
    ok(
      await analyst.POST('/api/v1/cases/{caseId}/rights/{rightId}/decisions', {
        params: { path: { caseId: made.id, rightId: 'Second line' } },
        body: { decision: 'postponed', date: today, reason: 'The offtake contract is not signed yet.' },
      }),
    );
    const series = new FormData();
    series.append('file', new Blob([`date,value\n${today},121.5\n`], { type: 'text/csv' }), 'values.csv');
    expect(
      ok(await analyst.POST('/api/v1/cases/{caseId}/observations/import', { params: { path: { caseId: made.id } }, body: series as never, ...multipart })),
    ).toEqual({ recorded: 1, from: today, to: today });
    const after = ok(await viewer.GET('/api/v1/cases/{caseId}/watch', { params: { path: { caseId: made.id } } }));
    expect(after.decisions.map((d) => [d.rightId, d.decision])).toEqual([['Second line', 'postponed']]);
    // The record says who did it: the keys, each under its creator's name.
    const activity = ok(await viewer.GET('/api/v1/projects/{projectId}/activity', { params: { path: { projectId: ids.project } } })).activity;
    expect(activity.find((a) => a.action === 'case.approve')?.actor).toMatch(/^API key Typed client reviewer .* \(created by .+\)$/);
    expect(activity.find((a) => a.action === 'case.submit')?.actor).toMatch(/^API key Typed client analyst /);
  }, 240_000);

  it('answers every other operation as the document says', async () => {
    const { analyst, reviewer, viewer } = keys;
    const caseId = ids.case;
    const path = { caseId };
    ok(await viewer.GET('/api/v1/projects', {}));
    const project = ok(await viewer.GET('/api/v1/projects/{projectId}', { params: { path: { projectId: ids.project } } })).project;
    ok(
      await analyst.PATCH('/api/v1/projects/{projectId}', {
        params: { path: { projectId: ids.project } },
        body: { description: 'Invented for a test; renamed' },
      }),
    );
    ok(await viewer.GET('/api/v1/projects/{projectId}/cases', { params: { path: { projectId: ids.project } } }));
    const empty = ok(await analyst.POST('/api/v1/projects', { body: { name: 'Typed scrap project' } })).project;
    expect((await analyst.DELETE('/api/v1/projects/{projectId}', { params: { path: { projectId: empty.id } } })).response.status).toBe(204);
    ok(await viewer.GET('/api/v1/cases', {}));
    ok(await viewer.GET('/api/v1/cases/{caseId}', { params: { path } }));
    ok(await viewer.GET('/api/v1/cases/{caseId}/valuations', { params: { path } }));
    ok(await viewer.GET('/api/v1/cases/{caseId}/snapshots', { params: { path } }));
    ok(await viewer.GET('/api/v1/cases/{caseId}/comments', { params: { path } }));
    ok(await reviewer.POST('/api/v1/cases/{caseId}/comments', { params: { path }, body: { section: 'uncertainty', body: 'Where does the 30 % come from?' } }));

    // A scenario: duplicated, compared, submitted and returned, submitted again and withdrawn, then a disposable copy deleted.
    const other = ok(await analyst.POST('/api/v1/cases/{caseId}/duplicate', { params: { path }, body: { name: 'Volatile demand' } })).case;
    ids.other = other.id;
    ok(await viewer.GET('/api/v1/compare', { params: { query: { cases: `${caseId},${other.id}` } } }));
    ok(await viewer.GET('/api/v1/compare.xlsx', { params: { query: { cases: `${caseId},${other.id}` } }, parseAs: 'arrayBuffer' }));
    const otherPath = { caseId: other.id };
    ok(
      await analyst.POST('/api/v1/cases/{caseId}/submit', {
        params: { path: otherPath },
        body: { recommendation: 'A scenario to read beside the base case.' },
      }),
    );
    ok(await reviewer.POST('/api/v1/cases/{caseId}/return', { params: { path: otherPath }, body: { reason: 'Show the volatility source.' } }));
    ok(await analyst.POST('/api/v1/cases/{caseId}/submit', { params: { path: otherPath }, body: { recommendation: 'Now with its source.' } }));
    ok(await analyst.POST('/api/v1/cases/{caseId}/withdraw', { params: { path: otherPath } }));
    const scrap = ok(await analyst.POST('/api/v1/cases/{caseId}/duplicate', { params: { path }, body: { name: 'Scrap' } })).case;
    expect((await analyst.DELETE('/api/v1/cases/{caseId}', { params: { path: { caseId: scrap.id } } })).response.status).toBe(204);
    ok(await analyst.POST('/api/v1/cases/{caseId}/revisions', { params: { path } }));

    // Files in and out.
    const template = ok(await viewer.GET('/api/v1/templates/cash-flows.xlsx', { parseAs: 'arrayBuffer' }));
    const workbook = new FormData();
    workbook.append('file', new Blob([template]), 'cash-flows.xlsx');
    ok(await analyst.POST('/api/v1/cases/{caseId}/cash-flows/import', { params: { path }, body: workbook as never, ...multipart }));
    const document = new FormData();
    document.append('file', new Blob(['date,value\n2026-01-01,1\n'], { type: 'text/csv' }), 'market-notes.csv');
    const attachment = ok(await analyst.POST('/api/v1/cases/{caseId}/attachments', { params: { path }, body: document as never, ...multipart })).attachment;
    ok(await viewer.GET('/api/v1/cases/{caseId}/attachments', { params: { path } }));
    ok(await viewer.GET('/api/v1/attachments/{attachmentId}', { params: { path: { attachmentId: attachment.id } }, parseAs: 'arrayBuffer' }));
    expect((await analyst.DELETE('/api/v1/attachments/{attachmentId}', { params: { path: { attachmentId: attachment.id } } })).response.status).toBe(204);
    ok(await viewer.GET('/api/v1/portfolio.csv', { parseAs: 'text' }));
    ok(await viewer.GET('/api/v1/portfolio.xlsx', { parseAs: 'arrayBuffer' }));

    // The engine directly, with the model the stored run was valued with.
    const run = ok(await analyst.POST('/api/v1/cases/{caseId}/valuations', { params: { path: otherPath } })).run;
    const result = ok(await viewer.POST('/api/v1/valuations', { params: { query: { extras: 'false' } }, body: run.input as never }));
    expect(result.expandedNpv).toBeCloseTo(run.result.expandedNpv, 6);
    const rerun = ok(await reviewer.POST('/api/v1/cases/{caseId}/valuations/{runId}/rerun', { params: { path: { caseId: other.id, runId: run.id } } }));
    expect(rerun.reproduced).toBe(true);

    // A cross-check cancelled at once, and one followed until it is done.
    const crossPath = { caseId: other.id };
    const big = ok(await reviewer.POST('/api/v1/cases/{caseId}/cross-checks', { params: { path: crossPath }, body: { paths: 200_000, seed: 1 } }));
    ok(await analyst.DELETE('/api/v1/cases/{caseId}/cross-checks/{crossCheckId}', { params: { path: { ...crossPath, crossCheckId: big.id } } }));
    const small = ok(await reviewer.POST('/api/v1/cases/{caseId}/cross-checks', { params: { path: crossPath }, body: { paths: 2_000, seed: 3 } }));
    let check = ok(await viewer.GET('/api/v1/cases/{caseId}/cross-checks/{crossCheckId}', { params: { path: { ...crossPath, crossCheckId: small.id } } }));
    for (let waited = 0; check.status === 'running' && waited < 90_000; waited += 1_000) {
      await new Promise((resolve) => setTimeout(resolve, 1_000));
      check = ok(await viewer.GET('/api/v1/cases/{caseId}/cross-checks/{crossCheckId}', { params: { path: { ...crossPath, crossCheckId: small.id } } }));
    }
    expect([check.status, check.error]).toEqual(['done', null]);
    expect(check.result!.monteCarlo.paths).toBe(2_000);
    // The validation report of that version, in both forms, and kept with the case by the reviewer.
    ok(await viewer.GET('/api/v1/cases/{caseId}/validation-report', { params: { path: crossPath, query: { size: 'LETTER' } }, parseAs: 'arrayBuffer' }));
    ok(await viewer.GET('/api/v1/cases/{caseId}/validation-report.xlsx', { params: { path: crossPath }, parseAs: 'arrayBuffer' }));
    const kept = ok(await reviewer.POST('/api/v1/cases/{caseId}/validation-report/attachments', { params: { path: crossPath } })).attachment;
    expect([kept.kind, kept.filename]).toEqual(['pdf', `${project.name} - ${other.name} - validation report v${other.version}.pdf`]);
    const checks = ok(await viewer.GET('/api/v1/cases/{caseId}/cross-checks', { params: { path: crossPath } })).crossChecks;
    expect(checks.map((c) => [c.id, c.status])).toEqual([
      [small.id, 'done'],
      [big.id, 'cancelled'],
    ]);

    // Volatility: from a history, and a Monte Carlo estimate started, read and cancelled.
    const series = Array.from({ length: 30 }, (_, k) => ({
      date: `2026-${String(1 + Math.floor(k / 28)).padStart(2, '0')}-${String(1 + (k % 28)).padStart(2, '0')}`,
      value: 100 * Math.exp(0.01 * Math.sin(k)),
    }));
    ok(await analyst.POST('/api/v1/volatility/history', { body: { series } }));
    const spec = { drivers: [{ line: 'revenue' as const, distribution: 'normal' as const, spread: 0.2 }], correlations: [], paths: 1_000_000, seed: 7 };
    const simulation = ok(await analyst.POST('/api/v1/volatility/simulations', { body: { caseId: other.id, spec } }));
    ok(await viewer.GET('/api/v1/volatility/simulations/{simulationId}', { params: { path: { simulationId: simulation.id } } }));
    ok(await analyst.DELETE('/api/v1/volatility/simulations/{simulationId}', { params: { path: { simulationId: simulation.id } } }));

    // The portfolio re-valuation, the settings, the keys, the document.
    const revaluation = ok(await analyst.POST('/api/v1/portfolio/revaluations', {}));
    ok(await viewer.GET('/api/v1/portfolio/revaluations/{revaluationId}', { params: { path: { revaluationId: revaluation.id } } }));
    const settings = ok(await viewer.GET('/api/v1/settings', {})).settings;
    ok(await admin.PATCH('/api/v1/settings', { body: settings }));
    const org = await db.selectFrom('organization').select('id').where('slug', '=', 'kestrel-bay-materials').executeTakeFirstOrThrow();
    ok(await viewer.GET('/api/v1/organisations/{orgId}/settings', { params: { path: { orgId: org.id } } }));
    const listed = ok(await admin.GET('/api/v1/api-keys', {})).apiKeys;
    const spare = ok(await admin.POST('/api/v1/api-keys', { body: { name: 'Spare', role: 'viewer' } }));
    expect(listed.every((k) => !('key' in k))).toBe(true);
    expect((await admin.DELETE('/api/v1/api-keys/{keyId}', { params: { path: { keyId: spare.id } } })).response.status).toBe(204);
    ok(await viewer.GET('/api/v1/openapi.json', {}));

    // Errors come in the documented shape too.
    expect((await viewer.POST('/api/v1/projects', { body: { name: 'Not mine to make' } })).response.status).toBe(403);
    expect((await analyst.POST('/api/v1/projects', { body: { name: '' } })).response.status).toBe(422);
    expect((await viewer.GET('/api/v1/cases/{caseId}', { params: { path: { caseId: 'no-such-case' } } })).response.status).toBe(404);
  }, 240_000);

  it('found every answer as the document describes it, and every operation answered', () => {
    expect(conformance.problems).toEqual([]);
    const all = conformance.operationIds();
    expect(all.sort()).toEqual(Object.keys(operations).sort());
    expect(all.filter((id) => !conformance.succeeded.has(id)).sort()).toEqual([]);
  });
});
