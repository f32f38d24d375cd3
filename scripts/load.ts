/**
 * `npm run load`: closed-loop clients against a running Leeway on loopback (start it with
 * `npm start`; LOAD_URL to point elsewhere on this machine). Each scenario runs CLIENTS clients
 * for SECONDS seconds, each sending its next request when the last answered, and prints
 * latency percentiles, throughput, answers by status, and the health check's latency sampled
 * once a second meanwhile. It signs in as the invented demo analyst, stops by itself and
 * changes nothing but one demo draft's stored runs.
 */
import { availableParallelism } from 'node:os';
import fourRights from '../lattice/examples/four-rights.json';

const base = process.env.LOAD_URL ?? 'http://127.0.0.1:3000';
if (!/^http:\/\/(127\.0\.0\.1|localhost)(:\d+)?$/.test(base)) throw new Error('load: loopback only (LOAD_URL must be http://127.0.0.1:PORT)');
const CLIENTS = Number(process.env.LOAD_CLIENTS ?? 20);
const SECONDS = Number(process.env.LOAD_SECONDS ?? 15);

async function signIn(): Promise<string> {
  const answer = await fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email: 'analyst@kestrelbay.example', password: 'leeway-demo-2026' }),
  });
  if (!answer.ok) throw new Error(`load: sign-in answered ${answer.status}; is the demo seeded?`);
  return answer.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

// The benchmark's model (invented figures), shared with `npm run bench`.
const fourOptions = fourRights;

type Send = () => Promise<Response>;

/** The queue and engine durations the valuation route reports in its Server-Timing header. */
function serverTiming(answer: Response): { queue: number; engine: number } {
  const header = answer.headers.get('server-timing') ?? '';
  const dur = (name: string) => Number(new RegExp(`${name};dur=([0-9.]+)`).exec(header)?.[1] ?? 0);
  return { queue: dur('queue'), engine: dur('engine') };
}

const percentile = (sorted: number[], p: number) => (sorted.length ? sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))]! : NaN);

async function scenario(name: string, next: (client: number, k: number) => Send) {
  const latencies: number[] = [];
  const overheads: number[] = [];
  const statuses = new Map<number | string, number>();
  const health: number[] = [];
  const end = Date.now() + SECONDS * 1000;
  const sampler = (async () => {
    while (Date.now() < end) {
      const started = performance.now();
      await fetch(`${base}/api/health`).catch(() => null);
      health.push(performance.now() - started);
      await new Promise((r) => setTimeout(r, 1000));
    }
  })();
  await Promise.all(
    Array.from({ length: CLIENTS }, async (_, client) => {
      for (let k = 0; Date.now() < end; k++) {
        const started = performance.now();
        let retryAfter = 0;
        const status = await next(client, k)()
          .then(async (r) => {
            await r.arrayBuffer();
            retryAfter = Number(r.headers.get('retry-after') ?? 0);
            if (r.headers.has('server-timing')) {
              const { queue, engine } = serverTiming(r);
              overheads.push(performance.now() - started - queue - engine);
            }
            return r.status;
          })
          .catch((e: Error) => e.name);
        latencies.push(performance.now() - started);
        statuses.set(status, (statuses.get(status) ?? 0) + 1);
        // A well-behaved client waits as it is told (here at most 2 s) before trying again.
        if (retryAfter > 0) await new Promise((r) => setTimeout(r, Math.min(2, retryAfter) * 1000));
      }
    }),
  );
  await sampler;
  const sorted = [...latencies].sort((a, b) => a - b);
  const hs = [...health].sort((a, b) => a - b);
  const ms = (x: number) => `${Math.round(x)} ms`;
  console.log(`\n${name} — ${CLIENTS} clients, ${SECONDS} s`);
  console.log(
    `  ${latencies.length} requests, ${(latencies.length / SECONDS).toFixed(1)}/s; p50 ${ms(percentile(sorted, 0.5))}, p95 ${ms(percentile(sorted, 0.95))}, p99 ${ms(percentile(sorted, 0.99))}`,
  );
  console.log(`  answers: ${[...statuses.entries()].map(([s, n]) => `${s} × ${n}`).join(', ')}`);
  const valued = statuses.get(200) ?? 0;
  if (overheads.length) {
    const sortedOverheads = [...overheads].sort((a, b) => a - b);
    console.log(
      `  valuations completed: ${(valued / SECONDS).toFixed(1)}/s; the API's own time (response less queue and engine): p50 ${ms(percentile(sortedOverheads, 0.5))}, p95 ${ms(percentile(sortedOverheads, 0.95))}`,
    );
  }
  console.log(`  health meanwhile: p50 ${ms(percentile(hs, 0.5))}, max ${ms(hs.at(-1) ?? NaN)}`);
  return valued / SECONDS;
}

const cookie = await signIn();
const headers = { cookie, origin: base };
const json = { ...headers, 'content-type': 'application/json' };
const cases = (await (await fetch(`${base}/api/v1/cases`, { headers })).json()) as { cases: { id: string; projectId: string; status: string }[] };
const draft = cases.cases.find((c) => c.status === 'draft');
if (!draft) throw new Error('load: no draft case to value; reseed the demo');

// One client alone (after three to warm the workers): where a valuation's time goes, with the
// answer gzip-compressed (what fetch and browsers ask for) and uncompressed.
const median = (xs: number[]) =>
  percentile(
    [...xs].sort((a, b) => a - b),
    0.5,
  );
async function alone(encoding: string) {
  const total: number[] = [];
  const engine: number[] = [];
  const own: number[] = [];
  for (let k = 0; k < 33; k++) {
    const started = performance.now();
    const answer = await fetch(`${base}/api/v1/valuations`, {
      method: 'POST',
      headers: { ...json, 'accept-encoding': encoding },
      body: JSON.stringify(fourOptions),
    });
    await answer.arrayBuffer();
    const elapsed = performance.now() - started;
    const timing = serverTiming(answer);
    if (k < 3) continue;
    total.push(elapsed);
    engine.push(timing.engine);
    own.push(elapsed - timing.engine - timing.queue);
  }
  console.log(
    `one four-option valuation at 500 steps with extras, alone, ${encoding} (median of 30): ${Math.round(median(total))} ms, of which ${Math.round(median(engine))} ms in the engine and ${Math.round(median(own))} ms the API's own (goal: under 20 ms)`,
  );
  return engine;
}
// The engine's time does not depend on the answer's encoding: the goal's baseline is the median
// of all 60, which moved less between runs than either half did (66 to 88 ms within a minute).
// This shared machine's speed drifts, so the baseline is measured again after (a): a goal is
// only judged against the machine's speed at the time, and a drift between the two is printed.
const cores = availableParallelism();
const goal = (engineMs: number) => 0.8 * cores * (1000 / engineMs);
const before = median([...(await alone('gzip')), ...(await alone('identity'))]);
console.log(`goal for (a): at least ${goal(before).toFixed(1)} valuations/s (80 % of ${cores} cores ÷ ${Math.round(before)} ms)`);

const completed = await scenario(
  '(a) stateless valuation, four options, 500 steps, extras',
  () => () => fetch(`${base}/api/v1/valuations`, { method: 'POST', headers: json, body: JSON.stringify(fourOptions) }),
);
const after = median([...(await alone('gzip')), ...(await alone('identity'))]);
const share = (engineMs: number) => `${Math.round((100 * completed) / goal(engineMs))} %`;
console.log(
  `(a) against its goal: ${share(before)} with the engine's time alone before it (${Math.round(before)} ms), ${share(after)} with its time after (${Math.round(after)} ms)` +
    (Math.abs(after / before - 1) > 0.15 ? " — the machine's speed moved by more than 15 % meanwhile: judge neither" : ''),
);

await scenario(
  '(b) the case page and the portfolio page',
  (client, k) => () => fetch((client + k) % 2 ? `${base}/portfolio` : `${base}/projects/${draft.projectId}/cases/${draft.id}`, { headers }),
);
await scenario(
  "(c) an analyst's mix: read the case, value and store it",
  (client, k) => () =>
    k % 3 === 2
      ? fetch(`${base}/api/v1/cases/${draft.id}/valuations`, { method: 'POST', headers: json })
      : fetch(`${base}/api/v1/cases/${draft.id}`, { headers }),
);
