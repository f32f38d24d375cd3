/** Bumped whenever a change can alter a number the engine returns; stored with every run. */
export const ENGINE_VERSION = 'leeway-lattice 2.0.0';
