/**
 * sharedFor (lib/shared-answer.ts), which keeps a flood of health checks to one check a second:
 * callers within the window share one run; after it, a new run starts; a failed run is shared
 * too and then retried. The clock is the test's own.
 */
import { describe, expect, it } from 'vitest';
import { sharedFor } from '@/lib/shared-answer';

describe('sharedFor', () => {
  it('runs once for every caller within the window, then again', async () => {
    let clock = 0;
    let runs = 0;
    const ask = sharedFor(
      1_000,
      async () => ++runs,
      () => clock,
    );
    const first = await Promise.all(Array.from({ length: 50 }, ask));
    expect(runs).toBe(1);
    expect(new Set(first)).toEqual(new Set([1]));
    clock = 999;
    expect(await ask()).toBe(1);
    clock = 1_000;
    expect(await ask()).toBe(2);
    expect(runs).toBe(2);
  });

  it('shares a run still going, and a failure, only within the window', async () => {
    let clock = 0;
    let runs = 0;
    let finish!: () => void;
    const ask = sharedFor(
      1_000,
      () => {
        runs++;
        return runs === 1 ? new Promise<number>((_, reject) => (finish = () => reject(new Error('database down')))) : Promise.resolve(runs);
      },
      () => clock,
    );
    const waiting = [ask(), ask(), ask()];
    expect(runs).toBe(1);
    finish();
    for (const answer of waiting) await expect(answer).rejects.toThrow('database down');
    clock = 1_500;
    expect(await ask()).toBe(2);
  });
});
