/**
 * Documented limits of the engine. They keep one valuation within the memory and time a web
 * request can afford on a 2-core machine.
 */

/** Most time steps in one lattice. */
export const MAX_STEPS = 10_000;
/** Most operating modes after templates are compiled (the combinations of exercised rights). */
export const MAX_MODES = 64;
/**
 * Most (node × switchable mode) cells one lattice pass may visit: a bound on the work of one
 * valuation (about a second here). Memory stays linear in steps per mode: values live in one
 * row per mode, and the decision map is run-length encoded by row.
 */
export const MAX_DECISION_CELLS = 150_000_000;
/**
 * Most (node × switchable mode) cells one whole valuation may visit, every re-run of its extras
 * included (the breakdown, convergence, the premium split, the sensitivities): about three
 * seconds here, so no single request can hold an engine worker for minutes.
 */
export const MAX_REQUEST_CELLS = 600_000_000;
/** Most (node × mode) cells returned when the caller asks for the full node grid. */
export const NODE_BUDGET = 200_000;
