/**
 * Whether the lattice and the independent Monte Carlo agree (docs/engine.md §11). The lattice's
 * expanded NPV comes with its convergence band; the Monte Carlo gives a value biased down (the
 * fitted rule on fresh paths) and one biased up (on the paths it was fitted to), each with its
 * standard error. They agree when the band meets [low − 3·SE, high + 3·SE]; otherwise the gap
 * between the two ranges says by how much they disagree.
 *
 * A right's use probability differs when the two are more than 0.1 apart and more than four
 * standard errors: a lattice of about a hundred steps moves a right's probability by a few points
 * between neighbouring step counts, and a fitted rule is least precise exactly where using a
 * right and waiting are worth almost the same (our choice; common practice, no source).
 */
import type { MonteCarloResult } from './least-squares';

/** What the lattice said about the same model. */
export interface LatticeFigures {
  expandedNpv: number;
  band: { low: number; high: number } | null;
  steps: number;
  engineVersion: string;
  rights: { id: string; exerciseProbability: number }[];
}

export interface RightComparison {
  id: string;
  lattice: number;
  monteCarlo: number;
  standardError: number;
  differs: boolean;
}

export interface Verdict {
  agrees: boolean;
  /** [low − 3·SE, high + 3·SE] of the Monte Carlo, in expanded NPV. */
  monteCarloRange: { low: number; high: number };
  /** The lattice's convergence band (its value alone when it has none). */
  latticeRange: { low: number; high: number };
  /** How far apart the two ranges are; 0 when they meet. */
  gap: number;
  /** The lattice's value less the middle of the Monte Carlo's two estimates. */
  difference: number;
  rights: RightComparison[];
}

export const STANDARD_ERRORS = 3;
export const PROBABILITY_TOLERANCE = 0.1;

export function judge(lattice: LatticeFigures, monteCarlo: MonteCarloResult): Verdict {
  const { lowBiased: low, highBiased: high } = monteCarlo;
  const monteCarloRange = {
    low: Math.min(low.expandedNpv, high.expandedNpv) - STANDARD_ERRORS * Math.max(low.standardError, high.standardError),
    high: Math.max(low.expandedNpv, high.expandedNpv) + STANDARD_ERRORS * Math.max(low.standardError, high.standardError),
  };
  const latticeRange = lattice.band ?? { low: lattice.expandedNpv, high: lattice.expandedNpv };
  const gap = Math.max(0, latticeRange.low - monteCarloRange.high, monteCarloRange.low - latticeRange.high);
  const rights = monteCarlo.rights.map((right) => {
    const latticeProbability = lattice.rights.find((r) => r.id === right.id)?.exerciseProbability ?? 0;
    const apart = Math.abs(latticeProbability - right.probability);
    return {
      id: right.id,
      lattice: latticeProbability,
      monteCarlo: right.probability,
      standardError: right.standardError,
      differs: apart > PROBABILITY_TOLERANCE && apart > 4 * right.standardError,
    };
  });
  return {
    agrees: gap === 0,
    monteCarloRange,
    latticeRange,
    gap,
    difference: lattice.expandedNpv - (low.expandedNpv + high.expandedNpv) / 2,
    rights,
  };
}
