/**
 * What `valueProject` returns (docs/engine.md §5). Money is in the model's currency, times in years.
 */
import type { TreeKind } from './schema';
import type { Money, Probability, Years } from './units';
import type { Snap } from './window';

/**
 * Where a right is used at one step where it is used at all: the project values between which
 * it is taken, located between nodes (`low` null: down to the bottom of the tree; `high` null:
 * up to its top). `critical` and `side` say it in one figure: taken above (or below) the
 * critical value; `between` for a band, whose critical value is its low edge; `anywhere` when
 * every node of the step takes it.
 */
export interface BoundaryPoint {
  t: Years;
  critical: Money | null;
  side: 'above' | 'below' | 'between' | 'anywhere';
  low: Money | null;
  high: Money | null;
}

export interface SwitchPath {
  from: string;
  to: string;
  boundary: BoundaryPoint[];
}

export interface RightResult {
  id: string;
  kind: string;
  /** Expanded NPV with only this right present, minus the static NPV (null without extras). */
  standalone: Money | null;
  /** Expanded NPV with all rights minus that with all but this one (null without extras). */
  incremental: Money | null;
  /** Risk-neutral probability that the right is ever exercised (first use, for reversible ones). */
  exerciseProbability: Probability;
  /** Risk-neutral probability of the first exercise at each step time, where it is above 0. */
  exerciseTiming: { t: Years; probability: Probability }[];
  /** Exercise region per step where it is used, from the mode where the right is first available. */
  boundary: BoundaryPoint[];
  /**
   * The decisions the first use leads to, in order, each from the mode the previous one enters,
   * with its own boundary: a stage right's later payments, a mothball right's restart. Absent
   * when there are none (and in runs before engine 4.2.0).
   */
  followUps?: SwitchPath[];
  /**
   * Every compiled path of the right (from mode → to mode) with its own boundary; only when asked
   * for (`ValueOptions.paths`): a right usable from several modes repeats its boundary per mode,
   * which was two thirds of a 500-step answer while nothing but the primary one is read.
   */
  paths?: SwitchPath[];
}

export interface TreeSummary {
  kind: TreeKind;
  steps: number;
  u: number;
  d: number;
  p: Probability;
  dt: Years;
  discount: number;
}

/**
 * How far the expanded NPV is from its many-step limit. `points` are expanded NPVs at step
 * counts that keep every decision date on the grid (nothing snaps differently), ending with the
 * case's own count N. With error ∝ 1/N, `extrapolated` is the Richardson extrapolation from N
 * and the largest such count ≤ N/2, and `errorEstimate` the larger of the two last changes
 * scaled to N's resolution; `band` is the expanded NPV ± twice that, and the test table of
 * tests/lattice/convergence.test.ts measures how often the 5000-step value falls inside it.
 */
export interface Convergence {
  points: { steps: number; expandedNpv: Money }[];
  extrapolated: Money;
  /** NaN when no coarser count keeps every date on the grid. */
  errorEstimate: Money;
  band: { low: Money; high: Money } | null;
  /** False when the dates do not all fall on N's grid either; then the counts are N/4 and N/2. */
  datesOnGrid: boolean;
}

export interface Sensitivity {
  parameter: string;
  label: string;
  base: number;
  low: { input: number; expandedNpv: Money | null };
  high: { input: number; expandedNpv: Money | null };
}

export interface NodeGrid {
  steps: { t: Years; underlying: number[]; modes: Record<string, { value: number[]; decision: (string | null)[] }> }[];
}

export interface ValuationResult {
  value: Money;
  staticNpv: Money;
  expandedNpv: Money;
  optionPremium: Money;
  /** The mode the project is in today; `value` is its root value. */
  startMode: string;
  modes: Record<string, Money>;
  rights: RightResult[];
  tree: TreeSummary;
  /**
   * The premium split in two (null without extras): `betterPlan`, what the same rights add when
   * nothing is uncertain (volatility → 0: the premium of using them on a known path), and
   * `uncertainty`, the rest: what they add because the future is not known.
   */
  premiumSplit: { betterPlan: Money; uncertainty: Money } | null;
  /**
   * What the rights are worth together beyond the sum of their stand-alone values (Trigeorgis
   * 1993): negative when they substitute (two puts on one plant), positive when they
   * complement. Null without extras or with fewer than two rights.
   */
  interaction: Money | null;
  convergence: Convergence | null;
  sensitivities: Sensitivity[] | null;
  snaps: Snap[];
  warnings: string[];
  engineVersion: string;
  grid?: NodeGrid;
}
