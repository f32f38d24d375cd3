/**
 * Recording a dated series of the project's value at once, from an uploaded CSV or XLSX read by
 * the same reader as a volatility history (dates in the first column, values in the second, a
 * header row skipped): every value must pass the rules of a single observation, and a refusal
 * names its line or cell. All or nothing: one bad row records none.
 */
import 'server-only';
import { AppError } from '../errors';
import { HistoryError } from '../volatility/history';
import { readCsvSeries, readXlsxSeries, type PlacedPoint } from '../volatility/read-series';
import { inspectUpload } from '../uploads/inspect';

/** More values than anyone follows a project with; a bound on the work one upload can ask for. */
export const MAX_IMPORTED_OBSERVATIONS = 2000;

export async function readObservationFile(name: string, bytes: Uint8Array): Promise<PlacedPoint[]> {
  const kind = inspectUpload(name, bytes, ['csv', 'xlsx']);
  let points: PlacedPoint[];
  try {
    points = kind === 'csv' ? readCsvSeries(new TextDecoder().decode(bytes)) : await readXlsxSeries(bytes);
  } catch (error) {
    if (error instanceof HistoryError) throw new AppError('unprocessable', error.message, { file: [error.message] });
    throw error;
  }
  const refuse = (message: string) => new AppError('unprocessable', message, { file: [message] });
  if (points.length === 0) throw refuse('The file holds no dated values: put dates (YYYY-MM-DD) in the first column and values in the second.');
  if (points.length > MAX_IMPORTED_OBSERVATIONS) throw refuse(`At most ${MAX_IMPORTED_OBSERVATIONS.toLocaleString('en-GB')} values in one upload.`);
  const bad = points.find((p) => !(p.value > 0) || p.value > 1e15);
  if (bad) throw refuse(`${bad.place}: the project value must be above 0 (and plausible), got ${bad.value}.`);
  return points;
}
