/**
 * sharedWhileRunning (lib/shared-answer.ts), which lets two first downloads of a board pack
 * render it once: callers with the same key share the run going, its answer or its failure, and
 * a new run starts once it has settled; other keys run on their own.
 * sharedFor, which keeps a flood of health checks to one check at a time
 * and a healthy report to one check a second: callers share a run while it runs; a kept answer
 * is reused within the window and a new run starts after it; an answer not to be kept, or a
 * failure, is shared only while its run is going. The clock is the test's own.
 */
import { describe, expect, it } from 'vitest';
import { sharedFor, sharedWhileRunning } from '@/lib/shared-answer';

const settle = () => new Promise((r) => setTimeout(r, 0));

describe('sharedFor', () => {
  it('runs once for every caller within the window, then again', async () => {
    let clock = 0;
    let runs = 0;
    const ask = sharedFor(
      1_000,
      async () => ++runs,
      undefined,
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

  it('shares a run still going, however long it takes', async () => {
    let clock = 0;
    let runs = 0;
    let finish!: (n: number) => void;
    const ask = sharedFor(
      1_000,
      () => (++runs === 1 ? new Promise<number>((resolve) => (finish = resolve)) : Promise.resolve(runs)),
      undefined,
      () => clock,
    );
    const waiting = [ask(), ask()];
    clock = 5_000;
    waiting.push(ask());
    expect(runs).toBe(1);
    finish(1);
    expect(await Promise.all(waiting)).toEqual([1, 1, 1]);
  });

  it('does not keep an answer it is told not to, nor a failure, once the run is over', async () => {
    let clock = 0;
    const answers = ['degraded', 'ok'];
    let runs = 0;
    const ask = sharedFor(
      1_000,
      async () => answers[runs++]!,
      (a) => a === 'ok',
      () => clock,
    );
    const during = [ask(), ask()];
    expect(await Promise.all(during)).toEqual(['degraded', 'degraded']);
    await settle();
    clock = 10;
    expect(await ask()).toBe('ok');
    await settle();
    clock = 20;
    expect(await ask()).toBe('ok');
    expect(runs).toBe(2);

    let failures = 0;
    const failing = sharedFor(
      1_000,
      () => Promise.reject(new Error(`database down ${++failures}`)),
      undefined,
      () => 0,
    );
    await expect(Promise.all([failing(), failing()])).rejects.toThrow('database down 1');
    await settle();
    await expect(failing()).rejects.toThrow('database down 2');
  });
});

describe('sharedWhileRunning', () => {
  it('shares the run going for a key, and only while it goes', async () => {
    const runs: string[] = [];
    let release!: () => void;
    const gate = new Promise<void>((r) => (release = r));
    const render = (key: string) => async () => {
      runs.push(key);
      await gate;
      return `${key} #${runs.length}`;
    };
    const asked = [
      sharedWhileRunning('pack:A4', render('pack:A4')),
      sharedWhileRunning('pack:A4', render('pack:A4')),
      sharedWhileRunning('pack:LETTER', render('pack:LETTER')),
    ];
    release();
    expect(await Promise.all(asked)).toEqual(['pack:A4 #2', 'pack:A4 #2', 'pack:LETTER #2']);
    expect(runs).toEqual(['pack:A4', 'pack:LETTER']);
    expect(await sharedWhileRunning('pack:A4', render('pack:A4'))).toBe('pack:A4 #3');
    expect(runs).toEqual(['pack:A4', 'pack:LETTER', 'pack:A4']);
  });

  it('gives a failure to every caller of that run, and runs again afterwards', async () => {
    let runs = 0;
    const failing = async () => {
      runs++;
      await settle();
      throw new Error('render failed');
    };
    const both = [sharedWhileRunning('failing', failing), sharedWhileRunning('failing', failing)];
    for (const asked of both) await expect(asked).rejects.toThrow('render failed');
    expect(runs).toBe(1);
    await expect(sharedWhileRunning('failing', failing)).rejects.toThrow('render failed');
    expect(runs).toBe(2);
  });
});
