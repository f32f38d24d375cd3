/**
 * Uploads are read in a thread that frees its place on every path (lib/uploads/read-in-thread.ts).
 * A stand-in worker written here answers, refuses, fails, exits, hangs or runs out of memory on
 * demand (the bytes say which), so each path is exercised without exceljs: after every failure
 * a plain read still answers, and a third read while two hang is told to wait (429).
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { AppError } from '@/lib/errors';
import { readInThread, type ReadLimits } from '@/lib/uploads/read-in-thread';
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

const limits: ReadLimits = { file, atOnce: 2, deadlineMs: 1_000, heapMb: 16 };
const bytes = (what: string) => new TextEncoder().encode(what);
const read = (what: string) => readInThread('series-csv', bytes(what), limits);
const plainReadAnswers = async () => expect(await read('rows')).toEqual({ reader: 'series-csv', what: 'rows' });

describe('reading an upload in a thread', () => {
  it('answers what the reader read, and a refusal as a HistoryError', async () => {
    await plainReadAnswers();
    await expect(read('refuse')).rejects.toBeInstanceOf(HistoryError);
  });

  it('frees its place after a failure, a crash, an exit, a deadline and running out of memory', async () => {
    await expect(read('fail')).rejects.toThrow('a bug');
    await expect(read('crash')).rejects.toThrow('boom');
    await expect(read('exit')).rejects.toThrow('stopped before answering');
    await expect(read('hang')).rejects.toMatchObject({ code: 'unprocessable', message: expect.stringMatching(/too long/) });
    await expect(read('memory')).rejects.toMatchObject({ code: 'unprocessable', message: expect.stringMatching(/too large/) });
    expect(globalThis.leewayUploadsReading).toBe(0);
    await plainReadAnswers();
  }, 30_000);

  it('tells a third reader to wait while two files are being read', async () => {
    const hanging = [read('hang'), read('hang')];
    const third = await read('rows').catch((error: unknown) => error);
    expect(third).toBeInstanceOf(AppError);
    expect(third).toMatchObject({ code: 'rate_limited', retryAfter: 3 });
    for (const h of hanging) await expect(h).rejects.toMatchObject({ code: 'unprocessable' });
    await plainReadAnswers();
  }, 30_000);
});
