/** Bumped whenever a change can alter a number or the shape of what the engine returns (2.1.0: `switches[].paths` only on request); stored with every run. */
export const ENGINE_VERSION = 'leeway-lattice 2.1.0';
