/**
 * How big a cross-check may be: paths in each pass, and the work of one run in
 * path × date × (state + move) units, about two minutes on this two-core machine (npm run bench
 * prints the time per 100 000 paths).
 */
export const PATH_LIMITS = { min: 1_000, max: 200_000, default: 20_000 } as const;
export const MAX_CROSS_CHECK_WORK = 2_000_000_000;
/** Cross-checks one organisation may have waiting or running at once. */
export const CROSS_CHECKS_PER_ORGANISATION = Number(process.env.CROSS_CHECKS_PER_ORGANISATION ?? 2);
