/**
 * Recording a dated series of the project's value at once, from an uploaded CSV or XLSX read by
 * the same reader as a volatility history (dates in the first column, values in the second, a
 * header row skipped): every value must pass the rules of a single observation, and a refusal
 * names its line or cell. All or nothing: one bad row records none.
 */
import 'server-only';
import { AppError } from '../errors';
import { observationSchema } from '../validations/observation';
import { HistoryError } from '../volatility/history';
import type { PlacedPoint } from '../volatility/read-series';
import { readSeriesUpload } from '../uploads/read-in-thread';
import { inspectUpload } from '../uploads/inspect';

/** More values than anyone follows a project with; a bound on the work one upload can ask for. */
export const MAX_IMPORTED_OBSERVATIONS = 2000;

export async function readObservationFile(name: string, bytes: Uint8Array, signal?: AbortSignal): Promise<PlacedPoint[]> {
  const kind = inspectUpload(name, bytes, ['csv', 'xlsx']);
  let points: PlacedPoint[];
  try {
    points = await readSeriesUpload(kind, bytes, signal);
  } catch (error) {
    if (error instanceof HistoryError) throw new AppError('unprocessable', error.message, { file: [error.message] });
    throw error;
  }
  const refuse = (message: string) => new AppError('unprocessable', message, { file: [message] });
  if (points.length === 0) throw refuse('The file holds no dated values: put dates (YYYY-MM-DD) in the first column and values in the second.');
  if (points.length > MAX_IMPORTED_OBSERVATIONS) throw refuse(`At most ${MAX_IMPORTED_OBSERVATIONS.toLocaleString('en-GB')} values in one upload.`);
  // The rule of a single observation's value (lib/validations/observation.ts), with its words.
  for (const p of points) {
    const checked = observationSchema.shape.value.safeParse(p.value);
    if (!checked.success) throw refuse(`${p.place}: ${checked.error.issues[0]!.message}`);
  }
  return points;
}
