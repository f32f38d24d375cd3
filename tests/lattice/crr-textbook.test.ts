/**
 * The CRR tree against published values and against an independent textbook implementation.
 * - Hull, *Options, Futures, and Other Derivatives*, ch. 21, Example 21.1: American put,
 *   S0 = K = 50, r = 0.10, σ = 0.40, T = 5/12 years. Hull prints 4.49 for 5 steps (two
 *   decimals, so ±0.005) and 4.263 / 4.272 / 4.278 / 4.283 for 30 / 50 / 100 / 500 steps
 *   (three decimals, so ±0.0005 from rounding).
 * - McDonald, *Derivatives Markets*, ch. 17: an option to defer with cash-flow leakage,
 *   S = 150, K = 100, r = ln 1.07, δ = ln 1.12, σ = 0.5, two annual steps, American: 55.80 with
 *   p* ≈ 0.335 (two and three decimals).
 *   Both tables live in reference/published-checks.ts, which the validation report reads too.
 * - A plain nested-array CRR written below from Cox, Ross & Rubinstein (1979) with the exercise
 *   test at every node: same steps, so the two must agree to rounding (1e-10 relative).
 */
import { describe, it } from 'vitest';
import { valueProject } from '@/lattice';
import { expectClose } from './support/check';
import { abandonOnly, deferOnly } from './support/models';
import { publishedChecks } from './reference/published-checks';

function textbookCrr(kind: 'call' | 'put', S: number, K: number, r: number, q: number, sigma: number, T: number, n: number): number {
  const dt = T / n;
  const u = Math.exp(sigma * Math.sqrt(dt));
  const d = 1 / u;
  const p = (Math.exp((r - q) * dt) - d) / (u - d);
  const disc = Math.exp(-r * dt);
  const payoff = (s: number) => (kind === 'call' ? Math.max(s - K, 0) : Math.max(K - s, 0));
  let values: number[] = [];
  for (let j = 0; j <= n; j++) values.push(payoff(S * u ** j * d ** (n - j)));
  for (let i = n - 1; i >= 0; i--) {
    const next: number[] = [];
    for (let j = 0; j <= i; j++) {
      const hold = disc * (p * values[j + 1]! + (1 - p) * values[j]!);
      next.push(Math.max(hold, payoff(S * u ** j * d ** (i - j))));
    }
    values = next;
  }
  return values[0]!;
}

describe('CRR tree', () => {
  it.each(publishedChecks.filter((c) => !c.source.startsWith('Longstaff')))('reproduces $source: $what ($published)', (check) => {
    const result = valueProject(check.model, { extras: false });
    expectClose(check.read(result), check.published, { abs: check.tolerance }, { source: check.source, what: check.what });
  });

  it('matches a textbook nested-array CRR at the same steps', () => {
    for (const [S, sigma, T, n, q] of [
      [90, 0.25, 1, 40, 0],
      [110, 0.45, 3, 90, 0.03],
      [100, 0.3, 0.5, 7, 0.06],
    ] as const) {
      const c = { value: S, strike: 100, rate: 0.05, volatility: sigma, horizon: T, steps: n, payoutYield: q };
      const put = valueProject(abandonOnly(c), { extras: false }).value - S;
      expectClose(put, textbookCrr('put', S, 100, 0.05, q, sigma, T, n), { rel: 1e-10, abs: 1e-12 }, { kind: 'put', ...c });
      const call = valueProject(deferOnly(c), { extras: false }).value;
      expectClose(call, textbookCrr('call', S, 100, 0.05, q, sigma, T, n), { rel: 1e-10, abs: 1e-12 }, { kind: 'call', ...c });
    }
  });
});
