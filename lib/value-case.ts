/**
 * Values a stored case in a worker thread: its inputs become the engine's model
 * (lib/case-model.ts), the engine runs off the request's event loop (lib/engine/pool.ts), and
 * the model's hash fingerprints exactly what was valued. A refused model is a 422.
 */
import type { Case } from '@/db/types';
import type { ValuationResult, ValueOptions } from '@/lattice';
import { caseToModel } from './case-model';
import { EngineRefusal, valueInWorker, type RunOptions } from './engine/pool';
import { AppError } from './errors';
import { hashModel, hashResult } from './model-hash';
import type { CaseInput } from './validations/case';

export interface CaseValuation {
  inputs: CaseInput;
  model: ReturnType<typeof caseToModel>['model'];
  warnings: string[];
  result: ValuationResult;
  inputHash: string;
  resultHash: string;
}

export async function valueStoredCase(stored: Case, options?: ValueOptions, run?: RunOptions): Promise<CaseValuation> {
  const inputs = { name: stored.name, cashFlows: stored.cash_flows, settings: stored.settings, options: stored.options } as CaseInput;
  const { model, warnings } = caseToModel(inputs);
  try {
    const result = await valueInWorker(model, options, run);
    return { inputs, model, warnings, result, inputHash: hashModel(model), resultHash: hashResult(result) };
  } catch (error) {
    if (error instanceof EngineRefusal) throw new AppError('unprocessable', `The case cannot be valued: ${error.issues[0]?.message}`);
    throw error;
  }
}
