/**
 * Requests that must not stop the engine for anyone, shared by the e2e tests
 * (tests/e2e/engine-bounds.test.ts) and `npm run faults` (scripts/faults.ts). Invented figures.
 */

/** A model small enough to value in milliseconds: the control that must still answer. */
export const smallModel = {
  underlying: { value: 100, volatility: 0.3 },
  riskFreeRate: 0.03,
  horizon: 3,
  steps: 60,
  investment: 90,
  options: [{ kind: 'abandon', salvage: 70, window: { kind: 'american', from: 0, to: 3 } }],
};

/** Twelve rights at 10,000 steps: far over the engine's work budget, refused before any work. */
export const twelveRightsModel = {
  ...smallModel,
  horizon: 10,
  steps: 10_000,
  options: Array.from({ length: 12 }, (_, k) => ({
    kind: 'abandon',
    id: `sale ${k + 1}`,
    salvage: 40 + k,
    window: { kind: 'american', from: k / 2, to: 10 },
  })),
};

/** A JSON array nested 100,000 deep (200 KB): refused before it is parsed. */
export const deeplyNestedBody = '['.repeat(100_000) + ']'.repeat(100_000);
