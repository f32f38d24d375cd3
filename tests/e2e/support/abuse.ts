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

/**
 * A workbook of `rows` dated values (about 5 MB at 200,000 rows, inside the upload limits):
 * read on the server's event loop it held every other request for 7.6 s. Written with
 * exceljs's streaming writer, so making it costs the sender little memory.
 */
export async function manyRowsWorkbook(rows: number): Promise<Buffer> {
  const { default: ExcelJS } = await import('exceljs');
  const { PassThrough } = await import('node:stream');
  const chunks: Buffer[] = [];
  const stream = new PassThrough();
  stream.on('data', (chunk: Buffer) => chunks.push(chunk));
  const book = new ExcelJS.stream.xlsx.WorkbookWriter({ stream });
  const sheet = book.addWorksheet('Values');
  const day = Date.UTC(2000, 0, 1);
  for (let k = 0; k < rows; k++) sheet.addRow([new Date(day + k * 86_400_000), 100 + (k % 17), k, k % 7, 1, 2, 3]).commit();
  sheet.commit();
  await book.commit();
  return Buffer.concat(chunks);
}
