/** Bumped whenever a change can alter a number or the shape of what the engine returns (2.2.0: `exercised`, rights used before the valuation date); stored with every run. */
export const ENGINE_VERSION = 'leeway-lattice 2.2.0';
