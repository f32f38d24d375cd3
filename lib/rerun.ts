/**
 * Re-running a stored run: its stored model is valued again by today's engine (in the worker
 * pool, like any valuation) and the result's hash compared with the stored one. Identical hashes
 * mean the run reproduces to the last bit; otherwise the answer says what moved and by how much
 * (lib/run-changes.ts). Nothing is stored: a re-run is a check, not a valuation of the case.
 */
import 'server-only';
import { readStoredModel } from '@/lattice';
import { db } from '@/db';
import { findValuationRun } from '@/db/queries/valuation-runs';
import type { Member } from './dal';
import { EngineRefusal, valueInWorker } from './engine/pool';
import { AppError } from './errors';
import { hashResult } from './model-hash';
import { figureChanges, partsThatDiffer } from './run-changes';

export async function rerun(member: Member, caseId: string, runId: string, signal?: AbortSignal) {
  const run = await findValuationRun(db, { orgId: member.orgId, caseId, runId });
  if (!run) throw new AppError('not_found', 'No such valuation run of this case in your organisation.');
  const storedHash = run.result_hash ?? hashResult(run.result);
  let result;
  try {
    // The options every stored run is valued with (lib/value-case.ts): the engine's defaults.
    result = await valueInWorker(readStoredModel(run.input), undefined, { owner: member.userId, signal });
  } catch (error) {
    if (error instanceof EngineRefusal)
      throw new AppError('unprocessable', `Today's engine refuses this run's stored model: ${error.issues[0]?.message ?? 'it is not valid'}.`);
    throw error;
  }
  const resultHash = hashResult(result);
  return {
    runId: run.id,
    caseVersion: run.case_version,
    storedEngineVersion: run.engine_version,
    engineVersion: result.engineVersion,
    storedHash,
    resultHash,
    reproduced: storedHash === resultHash,
    moved: figureChanges(run.result, result),
    partsThatDiffer: storedHash === resultHash ? [] : partsThatDiffer(run.result, result),
  };
}
