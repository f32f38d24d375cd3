/**
 * A result stored by any engine version, read in today's shape. Until leeway-lattice 3.0.0 the
 * rights were listed under `switches` (the engine's word for a move between modes, which a
 * right is not); a stored run or snapshot keeps the version and the JSON it was computed with
 * (append-only), and every read of one goes through here.
 */
import type { ValuationResult } from './result';

export function readStoredResult(stored: unknown): ValuationResult {
  if (stored && typeof stored === 'object' && !('rights' in stored) && 'switches' in stored) {
    const { switches, ...rest } = stored as Record<string, unknown>;
    return { ...rest, rights: switches } as unknown as ValuationResult;
  }
  return stored as ValuationResult;
}
