/**
 * Uploads are read in a bounded thread that gives its place back on every path
 * (lib/uploads/read-in-thread.ts on lib/threads/bounded.ts). A stand-in worker written here
 * answers, refuses, fails, exits, hangs or runs out of memory on demand (the bytes say which), so
 * each path is exercised without exceljs: after every failure a plain read still answers; a third
 * read while two run waits for a place, and one more than may wait is refused (429); a caller
 * that goes away (a closed download) leaves the wait or has its thread stopped.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { AppError } from '@/lib/errors';
import { inBoundedThread, threadPlaces, type ThreadLimits } from '@/lib/threads/bounded';
import { readInThread } from '@/lib/uploads/read-in-thread';
import { HistoryError } from '@/lib/volatility/history';

const file = path.join(mkdtempSync(path.join(tmpdir(), 'leeway-upload-')), 'worker.mjs');
writeFileSync(
  file,
  `import { parentPort, workerData } from 'node:worker_threads';
const what = new TextDecoder().decode(workerData.bytes);
if (what === 'hang') for (;;) {}
if (what === 'exit') process.exit(3);
if (what === 'crash') throw new Error('boom');
if (what === 'memory') { const kept = []; for (;;) kept.push(new Array(100_000).fill({ what })); }
if (what === 'refuse') parentPort.postMessage({ ok: false, refusal: 'Line 7: expected a number.' });
else if (what === 'fail') parentPort.postMessage({ ok: false, error: 'a bug' });
else parentPort.postMessage({ ok: true, value: { reader: workerData.reader, what } });
`,
);

const limits: ThreadLimits = { file, atOnce: 2, waiting: 1, waitMs: 5_000, deadlineMs: 1_000, heapMb: 16 };
const read = (what: string, within = limits) => readInThread('series-csv', new TextEncoder().encode(what), { limits: within });
const plainReadAnswers = async () => expect(await read('rows')).toEqual({ reader: 'series-csv', what: 'rows' });

describe('reading an upload in a thread', () => {
  it('answers what the reader read, and a refusal as a HistoryError', async () => {
    await plainReadAnswers();
    await expect(read('refuse')).rejects.toBeInstanceOf(HistoryError);
  });

  it('gives its place back after a failure, a crash, an exit, a deadline and running out of memory', async () => {
    await expect(read('fail')).rejects.toThrow('a bug');
    await expect(read('crash')).rejects.toThrow('boom');
    await expect(read('exit')).rejects.toThrow('stopped before answering');
    await expect(read('hang')).rejects.toMatchObject({ code: 'unprocessable', message: expect.stringMatching(/too long/) });
    await expect(read('memory')).rejects.toMatchObject({ code: 'unprocessable', message: expect.stringMatching(/too large/) });
    expect(threadPlaces('upload')).toEqual({ running: 0, waiting: 0 });
    await plainReadAnswers();
  }, 30_000);

  it('lets a third read wait for a place, refuses one more than may wait, and one that waits too long', async () => {
    const hanging = [read('hang'), read('hang')];
    const third = read('rows');
    await new Promise((r) => setTimeout(r, 100));
    expect(threadPlaces('upload')).toEqual({ running: 2, waiting: 1 });
    const fourth = await read('rows').catch((error: unknown) => error);
    expect(fourth).toBeInstanceOf(AppError);
    expect(fourth).toMatchObject({ code: 'rate_limited', retryAfter: 3 });
    // The hanging reads reach their deadline; the waiting one is handed a place and answers.
    for (const h of hanging) await expect(h).rejects.toMatchObject({ code: 'unprocessable' });
    expect(await third).toEqual({ reader: 'series-csv', what: 'rows' });

    const impatient = { ...limits, waitMs: 200 };
    const busy = [read('hang'), read('hang')];
    await expect(read('rows', impatient)).rejects.toMatchObject({ code: 'rate_limited' });
    for (const h of busy) await expect(h).rejects.toMatchObject({ code: 'unprocessable' });
    expect(threadPlaces('upload')).toEqual({ running: 0, waiting: 0 });
    await plainReadAnswers();
  }, 30_000);

  it('lets a caller that goes away leave the wait, or stops its thread, and frees the place', async () => {
    // The deadline is far off, so only the signal can stop these threads within the test's time.
    const patient = { ...limits, deadlineMs: 60_000 };
    const refusals = { busy: 'busy', tooLong: () => new AppError('unavailable', 'too long'), tooLarge: () => new AppError('unavailable', 'too large') };
    const run = (what: string, signal: AbortSignal) => inBoundedThread('closed-download', { bytes: new TextEncoder().encode(what) }, patient, refusals, signal);
    const places = () => threadPlaces('closed-download');
    const [first, second, third] = [new AbortController(), new AbortController(), new AbortController()];
    const hanging = [run('hang', first.signal), run('hang', second.signal)];
    const waiting = run('rows', third.signal);
    await new Promise((r) => setTimeout(r, 100));
    expect(places()).toEqual({ running: 2, waiting: 1 });

    third.abort();
    await expect(waiting).rejects.toMatchObject({ code: 'bad_request', message: 'The request was cancelled.' });
    expect(places()).toEqual({ running: 2, waiting: 0 });
    first.abort();
    await expect(hanging[0]).rejects.toMatchObject({ code: 'bad_request' });
    expect(places()).toEqual({ running: 1, waiting: 0 });
    second.abort();
    await expect(hanging[1]).rejects.toMatchObject({ code: 'bad_request' });
    expect(places()).toEqual({ running: 0, waiting: 0 });

    // Gone before it asked: no thread is started.
    await expect(run('rows', AbortSignal.abort())).rejects.toMatchObject({ code: 'bad_request' });
    expect(places()).toEqual({ running: 0, waiting: 0 });
    expect(await run('rows', new AbortController().signal)).toEqual({ ok: true, value: { reader: undefined, what: 'rows' } });
  }, 10_000);

  it('stops reading an upload whose sender went away', async () => {
    const gone = new AbortController();
    const reading = readInThread('series-csv', new TextEncoder().encode('hang'), { limits: { ...limits, deadlineMs: 60_000 }, signal: gone.signal });
    await new Promise((r) => setTimeout(r, 100));
    expect(threadPlaces('upload')).toEqual({ running: 1, waiting: 0 });
    gone.abort();
    await expect(reading).rejects.toMatchObject({ code: 'bad_request' });
    expect(threadPlaces('upload')).toEqual({ running: 0, waiting: 0 });
  }, 10_000);
});
