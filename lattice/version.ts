/**
 * Bumped whenever a change can alter a number or the shape of what the engine takes or returns;
 * stored with every run. 3.0.0: the result lists its rights under `rights`, not `switches`
 * (lattice/stored-result.ts reads older runs). 4.0.0: a right names its kind under `kind`, and
 * the right to pause and restart is `mothball`, not `switch` (lattice/stored-model.ts reads
 * older models).
 */
export const ENGINE_VERSION = 'leeway-lattice 4.0.0';
