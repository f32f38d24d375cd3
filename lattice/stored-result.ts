/**
 * A result stored by any engine version, read in today's shape. Until leeway-lattice 3.0.0 the
 * rights were listed under `switches` (the engine's word for a move between modes, which a
 * right is not); until 4.0.0 the right to pause and restart had the kind `switch`, now
 * `mothball` (lattice/stored-model.ts reads the models). A stored run or snapshot keeps the
 * version and the JSON it was computed with (append-only), and every read of one goes through here.
 */
import type { RightResult, ValuationResult } from './result';

export function readStoredResult(stored: unknown): ValuationResult {
  if (!stored || typeof stored !== 'object') return stored as ValuationResult;
  const { switches, ...rest } = stored as Record<string, unknown>;
  const rights = ('rights' in rest ? rest.rights : switches) as RightResult[] | undefined;
  if (!Array.isArray(rights)) return stored as ValuationResult;
  return { ...rest, rights: rights.map((r) => (r.kind === 'switch' ? { ...r, kind: 'mothball' } : r)) } as unknown as ValuationResult;
}
