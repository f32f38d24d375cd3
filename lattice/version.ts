/** Bumped whenever a change can alter a number or the shape of what the engine returns (3.0.0: the result lists its rights under `rights`, not `switches`; lattice/stored-result.ts reads older runs); stored with every run. */
export const ENGINE_VERSION = 'leeway-lattice 3.0.0';
