/**
 * Volatility from history, as the analyst uses it: upload a CSV of dated values, read the
 * estimate and apply it to the case, which then records where its volatility came from. The
 * API answers JSON series exactly as the estimator does, refuses mistyped, malformed and
 * oversized files with their own messages, and refuses roles that cannot edit.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { formatPercent } from '@/lib/format';
import { estimateFromHistory } from '@/lib/volatility/history';
import { normalDraws } from '@/lib/volatility/normal-draws';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

let caseUrl = '';
let caseId = '';

/** 121 month-ends of a GBM with σ = 25 % a year (seeded, so the file is always the same). */
function monthlyCsv(): { csv: string; series: { date: string; value: number }[] } {
  const z = normalDraws(42);
  let value = 80;
  const series = Array.from({ length: 121 }, (_, k) => {
    if (k > 0) value *= Math.exp((-0.5 * 0.0625) / 12 + 0.25 * Math.sqrt(1 / 12) * z());
    return { date: new Date(Date.UTC(2014, k + 1, 0)).toISOString().slice(0, 10), value: Number(value.toFixed(4)) };
  });
  return { csv: ['date,price', ...series.map((p) => `${p.date},${p.value}`)].join('\n'), series };
}

beforeAll(async () => {
  ({ caseId, url: caseUrl } = await demoCase('Older extrusion line', 'Base case'));
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('volatility from history', () => {
  it('is estimated from an uploaded CSV, applied to the case and recorded with its source', async () => {
    const { csv, series } = monthlyCsv();
    const expected = estimateFromHistory(series);
    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    await page.goto(caseUrl);
    await page.getByRole('tab', { name: 'Uncertainty' }).click();
    await page
      .getByLabel('History file (CSV or XLSX, up to 10 MB)')
      .setInputFiles({ name: 'comparable-prices.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await page.getByRole('button', { name: 'Estimate volatility' }).click();
    const apply = page.getByRole('button', { name: `Use ${formatPercent(expected.volatility)} for this case` });
    await expect.poll(() => apply.isVisible(), { timeout: 20_000 }).toBe(true);
    expect(await page.getByText('monthly', { exact: true }).isVisible()).toBe(true);
    await apply.click();
    expect(await page.getByLabel('Volatility (%)', { exact: true }).inputValue()).toBe(
      String(Number((Number(expected.volatility.toFixed(4)) * 100).toFixed(6))),
    );
    await page.getByRole('button', { name: 'Save' }).click();
    await expect.poll(() => page.getByText(/Version 2 · saved/).isVisible()).toBe(true);
    const saved = (await (await page.request.get(`/api/v1/cases/${caseId}`)).json()).case;
    expect(saved.settings.volatility).toBe(Number(expected.volatility.toFixed(4)));
    expect(saved.settings.volatilitySource.method).toBe('history');
    expect(saved.settings.volatilitySource.note).toContain('comparable-prices.csv, 121 monthly values from 2014-01-31 to 2024-01-31');
    await context.close();
  });

  it('answers JSON as the estimator does, and refuses bad files, bad series and the wrong role', async () => {
    const { series } = monthlyCsv();
    const analyst = await signedInPage('analyst@kestrelbay.example');
    const api = analyst.page.request;
    const json = await api.post('/api/v1/volatility/history', { data: { series } });
    expect(json.status()).toBe(200);
    const body = await json.json();
    const expected = estimateFromHistory(series);
    expect([body.volatility, body.frequency, body.observations, body.interval]).toEqual([
      expected.volatility,
      expected.frequency,
      expected.observations,
      expected.interval,
    ]);

    const upload = (name: string, mimeType: string, buffer: Buffer) =>
      api.post('/api/v1/volatility/history', { multipart: { file: { name, mimeType, buffer } } });
    const message = async (res: Awaited<ReturnType<typeof upload>>) => [res.status(), (await res.json()).error.message];
    expect(await message(await upload('prices.csv', 'text/csv', Buffer.from('%PDF-1.4 not really')))).toEqual([
      422,
      '“prices.csv” is named CSV but its content is PDF.',
    ]);
    expect(await message(await upload('prices.csv', 'text/csv', Buffer.from('date,value\n2024-01-31,10\n2024-02-29,n/a\n')))).toEqual([
      422,
      'Line 3: expected a number, got “n/a”.',
    ]);
    expect(await message(await upload('notes.docx', 'application/octet-stream', Buffer.from('hello')))).toEqual([
      422,
      '“notes.docx” is not one of the accepted types (CSV, XLSX).',
    ]);
    expect((await upload('huge.csv', 'text/csv', Buffer.alloc(11 * 1024 * 1024, 65))).status()).toBe(413);
    const negative = series.map((p, k) => (k === 3 ? { ...p, value: -1 } : p));
    expect(await message(await api.post('/api/v1/volatility/history', { data: { series: negative } }))).toEqual([
      422,
      `Row 4 (${series[3]!.date}): the value is -1; log returns need values above 0.`,
    ]);
    await analyst.context.close();

    const viewer = await signedInPage('executive@kestrelbay.example');
    expect((await viewer.page.request.post('/api/v1/volatility/history', { data: { series } })).status()).toBe(403);
    await viewer.context.close();
  });
});
