/**
 * A seeded, bounded fuzz of every API route (lib/api.ts's guards, lib/request-body.ts): ids with
 * NUL bytes, malformed percent-encoding, unpaired surrogates and oversize text, bodies that are
 * not JSON or nest deep, each sent to every route as the analyst and without a session. The
 * answer is always a 4xx, never a 5xx. The seed is printed, so a failure can be replayed.
 */
import { uniformInt } from 'pure-rand/distribution/uniformInt';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import type { APIRequestContext, BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeBrowser, newContext, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

const SEED = Number(process.env.FUZZ_SEED ?? 20261202);
const ROUNDS = 3;

// Every route under app/api/v1, with `:id` where a path id goes.
const routes: [string, string][] = [
  ['GET', '/api/v1/projects'],
  ['POST', '/api/v1/projects'],
  ['GET', '/api/v1/projects/:id'],
  ['PATCH', '/api/v1/projects/:id'],
  ['DELETE', '/api/v1/projects/:id'],
  ['GET', '/api/v1/projects/:id/activity'],
  ['GET', '/api/v1/projects/:id/cases'],
  ['POST', '/api/v1/projects/:id/cases'],
  ['GET', '/api/v1/cases'],
  ['GET', '/api/v1/cases/:id'],
  ['PATCH', '/api/v1/cases/:id'],
  ['DELETE', '/api/v1/cases/:id'],
  ['GET', '/api/v1/cases/:id/export.xlsx'],
  ['GET', '/api/v1/cases/:id/snapshots'],
  ['POST', '/api/v1/cases/:id/cash-flows/import'],
  ['POST', '/api/v1/cases/:id/submit'],
  ['POST', '/api/v1/cases/:id/duplicate'],
  ['POST', '/api/v1/cases/:id/approve'],
  ['POST', '/api/v1/cases/:id/revisions'],
  ['POST', '/api/v1/cases/:id/return'],
  ['POST', '/api/v1/cases/:id/withdraw'],
  ['GET', '/api/v1/cases/:id/board-pack'],
  ['GET', '/api/v1/cases/:id/validation-report'],
  ['GET', '/api/v1/cases/:id/validation-report.xlsx'],
  ['POST', '/api/v1/cases/:id/validation-report/attachments'],
  ['GET', '/api/v1/cases/:id/watch'],
  ['POST', '/api/v1/cases/:id/observations'],
  ['POST', '/api/v1/cases/:id/observations/import'],
  ['POST', '/api/v1/cases/:id/rights/:id/decisions'],
  ['POST', '/api/v1/cases/:id/valuations'],
  ['GET', '/api/v1/cases/:id/valuations'],
  ['POST', '/api/v1/cases/:id/valuations/:id/rerun'],
  ['POST', '/api/v1/cases/:id/cross-checks'],
  ['GET', '/api/v1/cases/:id/cross-checks'],
  ['GET', '/api/v1/cases/:id/cross-checks/:id'],
  ['DELETE', '/api/v1/cases/:id/cross-checks/:id'],
  ['GET', '/api/v1/cases/:id/attachments'],
  ['POST', '/api/v1/cases/:id/attachments'],
  ['GET', '/api/v1/cases/:id/comments'],
  ['POST', '/api/v1/cases/:id/comments'],
  ['GET', '/api/v1/reviews'],
  ['GET', '/api/v1/templates/cash-flows.xlsx'],
  ['GET', '/api/v1/settings'],
  ['PATCH', '/api/v1/settings'],
  ['GET', '/api/v1/compare'],
  ['GET', '/api/v1/compare.xlsx'],
  ['POST', '/api/v1/valuations'],
  ['GET', '/api/v1/attachments/:id'],
  ['DELETE', '/api/v1/attachments/:id'],
  ['POST', '/api/v1/volatility/history'],
  ['POST', '/api/v1/volatility/simulations'],
  ['POST', '/api/v1/portfolio/revaluations'],
  ['GET', '/api/v1/volatility/simulations/:id'],
  ['DELETE', '/api/v1/volatility/simulations/:id'],
  ['GET', '/api/v1/organisations/:id/settings'],
  ['GET', '/api/v1/portfolio.csv'],
  ['GET', '/api/v1/portfolio.xlsx'],
  ['GET', '/api/v1/openapi.json'],
  ['GET', '/api/v1/api-keys'],
  ['POST', '/api/v1/api-keys'],
  ['DELETE', '/api/v1/api-keys/:id'],
];

// Path ids an attacker tries; each is already percent-encoded as it goes on the wire.
const badIds = ['%00', 'abc%00def', '%E0%A4%A', '%', '%ZZ', '%ED%A0%80', '..%2F..%2Fsettings', 'x'.repeat(5000), "1'%20OR%20'1'='1", '%F0%9F%98%80'];
const badQueries = ['?cases=%00', '?cases=%E0%A4%A', '?size=%00', '?cases=a,b,c,d,e,f', '?ids=' + 'a,'.repeat(2000)];
const badBodies: { type: string; body: string }[] = [
  { type: 'application/json', body: '{"name":"a\\u0000b","description":""}' },
  { type: 'application/json', body: '{"name":"\\ud800","description":"\\udfff"}' },
  { type: 'application/json', body: '['.repeat(100_000) + ']'.repeat(100_000) },
  { type: 'application/json', body: '{"name":' },
  { type: 'application/json', body: 'null' },
  { type: 'application/json', body: '"just a string"' },
  { type: 'application/json', body: JSON.stringify({ name: 'x'.repeat(200_000) }) },
  { type: 'text/plain', body: '{"name":"x"}' },
  { type: 'multipart/form-data; boundary=zzz', body: '--zzz\r\nContent-Disposition: form-data; name="file"\r\n\r\nbroken' },
  { type: 'application/x-www-form-urlencoded', body: 'name=x' },
];

const contexts: BrowserContext[] = [];
let analyst: APIRequestContext;
let anonymous: APIRequestContext;
let realCase = '';

beforeAll(async () => {
  const signed = await signedInPage('analyst@kestrelbay.example');
  contexts.push(signed.context);
  analyst = signed.page.request;
  const anon = await newContext();
  contexts.push(anon);
  anonymous = anon.request;
  realCase = (await demoCase('Cold-storage hub', 'Base case')).caseId;
});

afterAll(async () => {
  for (const c of contexts) await c.close();
  await closeBrowser();
});

describe(`fuzzing every API route (seed ${SEED})`, () => {
  it('never answers 5xx', async () => {
    let rng = xoroshiro128plus(SEED);
    const pick = <T>(xs: T[]): T => {
      const k = uniformInt(rng, 0, xs.length - 1);
      return xs[k]!;
    };
    const failures: string[] = [];
    let sent = 0;
    for (let round = 0; round < ROUNDS; round++) {
      for (const [method, template] of routes) {
        for (const who of [analyst, anonymous]) {
          // A bad id where there is one (or a real case id with a bad query), and a bad body for writes.
          const id = template.includes(':id') ? pick([...badIds, realCase]) : '';
          const path = template.replaceAll(':id', id) + (method === 'GET' ? pick(['', ...badQueries]) : '');
          const body = method === 'GET' || method === 'DELETE' ? undefined : pick(badBodies);
          const answer = await who.fetch(path, {
            method,
            headers: body ? { 'content-type': body.type } : {},
            data: body?.body,
            timeout: 60_000,
          });
          sent++;
          if (answer.status() >= 500)
            failures.push(`${method} ${path.slice(0, 120)} ${body ? `[${body.type}] ${body.body.slice(0, 40)}` : ''} → ${answer.status()}`);
        }
      }
      rng = xoroshiro128plus(SEED + round + 1);
    }
    console.log(`[fuzz] seed ${SEED}: ${sent} requests, ${failures.length} answered 5xx`);
    expect(failures).toEqual([]);
  });
});
