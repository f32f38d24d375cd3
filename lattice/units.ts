/**
 * Units of the engine's inputs and outputs. They are plain numbers at run time; the names say
 * what a number means so a reader never has to guess whether a rate is a percentage or a
 * fraction, or whether a time is in steps or in years.
 */

/** Time measured in years from the valuation date (t = 0). */
export type Years = number;
/** An amount of money in the model's currency (the engine never converts currencies). */
export type Money = number;
/** A continuously compounded rate per year, as a fraction: 0.05 means 5 % a year. */
export type RatePerYear = number;
/** Annualised volatility of the project's value returns, as a fraction: 0.3 means 30 %. */
export type Volatility = number;
/** A probability in [0, 1]. */
export type Probability = number;
