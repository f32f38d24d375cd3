/**
 * Bumped whenever a change can alter a number or the shape of what the engine takes or returns;
 * stored with every run. 3.0.0: the result lists its rights under `rights`, not `switches`
 * (lattice/stored-result.ts reads older runs). 4.0.0: a right names its kind under `kind`, and
 * the right to pause and restart is `mothball`, not `switch` (lattice/stored-model.ts reads
 * older models). 4.1.0: an American window keeps the steps inside it (its start snaps up, its
 * end down; lattice/window.ts), so a step count that splits a window's dates values a little less
 * than before, never a date the window does not allow. 4.2.0: a right's result lists the
 * decisions its first use leads to (`followUps`: a stage right's later payments, a mothball
 * right's restart) with their boundaries; no figure changes. 4.3.0: a switch is taken only where
 * it beats continuing by more than rounding (lattice/rollback.ts, TIE), so where waiting costs
 * nothing (no payout, r = 0) a right is no longer reported as used early; values move by at most
 * 1e-11 of the money at a node. In the same version a node's V is lowest·rise (not a running
 * product) and the default pass skips known nodes too: other figures move in their last digits.
 */
export const ENGINE_VERSION = 'leeway-lattice 4.3.0';
