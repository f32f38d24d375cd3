/** Decimals that tell evenly spaced ticks apart: 0 for a step of 1 or more, 1 for 0.5, 2 for 0.05. */
export function tickDigits(ticks: number[]): number {
  if (ticks.length < 2) return 1;
  return Math.max(0, Math.min(6, Math.ceil(-Math.log10(ticks[1]! - ticks[0]!) - 1e-9)));
}
