/**
 * Supporting documents: attached from the Documents tab, listed with uploader and date,
 * downloaded byte for byte, removed by an analyst; type judged by content, size limited; the
 * executive reads but cannot add or remove; another organisation sees nothing.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

let caseId = '';
let caseUrl = '';
// A 1×1 PNG (signature, IHDR, IDAT, IEND).
const png = Buffer.from(
  '89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d49444154789c6360000002000154a24f5d0000000049454e44ae426082',
  'hex',
);

beforeAll(async () => {
  ({ caseId, url: caseUrl } = await demoCase('Cold-storage hub', 'Calmer market'));
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('supporting documents', () => {
  it('are attached from the Documents tab, downloaded byte for byte and removed', async () => {
    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    await page.goto(caseUrl);
    await page.getByRole('tab', { name: 'Documents' }).click();
    await page
      .getByLabel('Attach a document (PDF, XLSX, CSV or PNG, up to 10 MB)')
      .setInputFiles({ name: 'site-plan.png', mimeType: 'image/png', buffer: png });
    await expect.poll(() => page.getByRole('link', { name: 'site-plan.png' }).isVisible(), { timeout: 20_000 }).toBe(true);
    expect(
      await page
        .getByRole('row', { name: /site-plan.png/ })
        .getByText('by Priya Lindqvist')
        .isVisible(),
    ).toBe(true);

    const list = (await (await page.request.get(`/api/v1/cases/${caseId}/attachments`)).json()).attachments;
    expect(list.map((a: { filename: string; kind: string; size: number }) => [a.filename, a.kind, a.size])).toEqual([['site-plan.png', 'png', png.length]]);
    const download = await page.request.get(`/api/v1/attachments/${list[0].id}`);
    expect(download.headers()['content-type']).toBe('image/png');
    expect(download.headers()['content-disposition']).toContain('attachment');
    expect(Buffer.from(await download.body()).equals(png)).toBe(true);

    const executive = await signedInPage('executive@kestrelbay.example');
    expect((await executive.page.request.get(`/api/v1/attachments/${list[0].id}`)).status()).toBe(200);
    expect((await executive.page.request.delete(`/api/v1/attachments/${list[0].id}`)).status()).toBe(403);
    expect(
      (
        await executive.page.request.post(`/api/v1/cases/${caseId}/attachments`, { multipart: { file: { name: 'x.png', mimeType: 'image/png', buffer: png } } })
      ).status(),
    ).toBe(403);
    const outsider = await signedInPage('owner@harrowfen.example');
    expect((await outsider.page.request.get(`/api/v1/attachments/${list[0].id}`)).status()).toBe(404);
    expect((await outsider.page.request.get(`/api/v1/cases/${caseId}/attachments`)).status()).toBe(404);
    expect((await outsider.page.request.delete(`/api/v1/attachments/${list[0].id}`)).status()).toBe(404);

    const mismatched = await page.request.post(`/api/v1/cases/${caseId}/attachments`, {
      multipart: { file: { name: 'minutes.pdf', mimeType: 'application/pdf', buffer: Buffer.from('a,b\n1,2\n') } },
    });
    expect([mismatched.status(), (await mismatched.json()).error.message]).toEqual([422, '“minutes.pdf” is named PDF but its content is CSV.']);
    expect(
      (
        await page.request.post(`/api/v1/cases/${caseId}/attachments`, {
          multipart: { file: { name: 'big.csv', mimeType: 'text/csv', buffer: Buffer.alloc(11 * 1024 * 1024, 65) } },
        })
      ).status(),
    ).toBe(413);

    await page.getByRole('button', { name: 'Remove site-plan.png' }).click();
    await expect.poll(() => page.getByText('No supporting documents yet.').isVisible()).toBe(true);
    expect((await page.request.get(`/api/v1/attachments/${list[0].id}`)).status()).toBe(404);
    for (const c of [{ context }, executive, outsider]) await c.context.close();
  });
});
