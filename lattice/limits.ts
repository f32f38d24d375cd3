/**
 * Documented limits of the engine. They keep one valuation within the memory and time a web
 * request can afford on a 2-core machine.
 */

/** Most time steps in one lattice. */
export const MAX_STEPS = 10_000;
/** Most operating modes after templates are compiled (the combinations of exercised rights). */
export const MAX_MODES = 64;
/**
 * Most (node × switchable mode) cells in the decision map, one byte each. The map is the only
 * structure that grows with steps²; it is kept for the forward pass that gives exercise
 * probabilities. 150 million cells is 150 MB.
 */
export const MAX_DECISION_CELLS = 150_000_000;
/** Most (node × mode) cells returned when the caller asks for the full node grid. */
export const NODE_BUDGET = 200_000;
